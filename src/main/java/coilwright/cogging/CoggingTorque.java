package coilwright.cogging;

import java.util.List;

/**
 * Cogging torque of a machine: the torque the magnets exert on the stator teeth with no current.
 *
 * @param peakToPeakNm          peak-to-peak over a period, N m
 * @param peakNm                largest |T| over a period, N m: what a rotor must overcome to start turning
 * @param cyclesPerRevolution   LCM(Q, 2p): cogging periods per mechanical revolution (0 for an air-cored stator)
 * @param periodDeg             one period in mechanical degrees (0 for an air-cored stator)
 * @param harmonics             the harmonics summed, first the fundamental at LCM(Q, 2p)
 * @param note                  method, or why there is none
 */
public record CoggingTorque(double peakToPeakNm, double peakNm, int cyclesPerRevolution, double periodDeg,
                            List<CoggingHarmonic> harmonics, String note) {
    public CoggingTorque {
        harmonics = List.copyOf(harmonics);
    }

    /** None, with the reason. */
    public static CoggingTorque none(String reason) {
        return new CoggingTorque(0, 0, 0, 0, List.of(), reason);
    }

    /**
     * Torque at a rotor angle from the harmonics, N m.
     *
     * @param rotorAngleRad mechanical angle from the position where a pole centre faces a slot centre, rad
     */
    public double torqueNm(double rotorAngleRad) {
        double t = 0;
        for (CoggingHarmonic h : harmonics) {
            t += h.amplitudeNm() * Math.sin(h.cyclesPerRevolution() * rotorAngleRad);
        }
        return t;
    }
}
