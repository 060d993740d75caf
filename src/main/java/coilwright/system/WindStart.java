package coilwright.system;

/**
 * Whether a wind rotor held still starts turning, and at what wind: its standstill torque against the alternator's
 * peak cogging torque plus the break-away friction of the bearings ({@link coilwright.turbine.WindStarting}).
 *
 * @param startingTorqueCoefficient Cq0 of the rotor at standstill
 * @param coefficientBasis          where Cq0 comes from, in words
 * @param coggingPeakNm             peak cogging torque at the alternator shaft, N m (0 for air-cored stators)
 * @param breakawayFrictionNm       break-away bearing friction at the alternator shaft, N m
 * @param startsTurningAtMs         steady wind speed at which the rotor starts to turn from rest, m/s
 * @param chargingStartsAtMs        wind speed at which charging begins once turning (the matched cut-in, the
 *                                  alternator's running drag counted), m/s
 * @param hardStartWindMs           wind speed exceeded only {@link WindAssessment#HARD_START_EXCEEDANCE} of the
 *                                  time at the site: a rotor needing more rarely starts there, m/s
 * @param chargesFromRestAtMs       the real start on a rising wind from rest: the rotor must first break away, then
 *                                  reach cut-in, so the larger of the two, m/s (0 when it never charges)
 */
public record WindStart(double startingTorqueCoefficient, String coefficientBasis, double coggingPeakNm,
                        double breakawayFrictionNm, double startsTurningAtMs, double chargingStartsAtMs,
                        double hardStartWindMs, double chargesFromRestAtMs) {
}
