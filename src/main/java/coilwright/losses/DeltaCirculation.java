package coilwright.losses;

import coilwright.machine.Connection;
import coilwright.validation.Checks;

/**
 * The third-harmonic current that circulates round a closed delta. The third-harmonic EMFs of the three phases are
 * in phase (zero sequence), so round the delta they add to 3 E3 and drive I3 = 3 E3 / (3 Z0) = E3 / Z0 through each
 * phase, Z0 = R_ph + j 3 omega_e L0, with or without load and without reaching the terminals. In star (no neutral)
 * there is no path and no such current. The whole of its power is copper loss, 3 I3^2 R_ph, taken from the shaft as a
 * drag torque P / omega. The band comes from the band of L0 ({@link ZeroSequenceInductance}); R_ph and L_ph are
 * the phase values at the working temperature. Further harmonics (9th, 15th) are neglected.
 *
 * @param thirdHarmonicEmfRmsV     E3 per phase, V rms
 * @param zeroSequenceImpedanceOhm |Z0| with the estimated L0, Ohm (0 in star)
 * @param currentRmsA              I3 per phase, A rms
 * @param currentLowA              I3 with the highest plausible L0, A
 * @param currentHighA             I3 with the lowest plausible L0, A
 * @param copperLossW              3 I3^2 R_ph, W
 * @param copperLossHighW          the loss at the high end of the current band, W
 * @param dragTorqueNm             copperLossW / omega_mech, N m (0 at standstill)
 * @param basis                    how L0 was estimated
 */
public record DeltaCirculation(double thirdHarmonicEmfRmsV, double zeroSequenceImpedanceOhm, double currentRmsA,
                               double currentLowA, double currentHighA, double copperLossW, double copperLossHighW,
                               double dragTorqueNm, String basis) {

    /**
     * The circulating current at one speed.
     *
     * @param connection            STAR gives zero
     * @param fundamentalPhaseEmfRmsV  E1 per phase at this speed and magnet temperature, V rms, &gt;= 0
     * @param thirdHarmonicEmfRatio E3 / E1 of the phase EMF, 0 to 1
     * @param phaseResistanceOhm    R_ph at the winding temperature, Ohm, &gt; 0
     * @param phaseInductanceH      L_ph, H, &gt;= 0
     * @param l0                    the zero-sequence estimate
     * @param poles                 2p
     * @param speedRpm              speed, rpm, &gt;= 0
     */
    public static DeltaCirculation at(Connection connection, double fundamentalPhaseEmfRmsV,
                                      double thirdHarmonicEmfRatio, double phaseResistanceOhm,
                                      double phaseInductanceH, ZeroSequenceInductance l0, int poles, double speedRpm) {
        new Checks().present("connection", connection).nonNegative("fundamentalPhaseEmfRmsV", fundamentalPhaseEmfRmsV)
                .range("thirdHarmonicEmfRatio", thirdHarmonicEmfRatio, 0, 1)
                .positive("phaseResistanceOhm", phaseResistanceOhm).nonNegative("phaseInductanceH", phaseInductanceH)
                .present("l0", l0).intRange("poles", poles, 2, 400).nonNegative("speedRpm", speedRpm).throwIfAny();
        double e3 = fundamentalPhaseEmfRmsV * thirdHarmonicEmfRatio;
        if (connection == Connection.STAR) {
            return new DeltaCirculation(e3, 0, 0, 0, 0, 0, 0, 0, "star: no closed path for zero-sequence current");
        }
        double x3PerL0 = 3 * 2 * Math.PI * (poles / 2.0) * speedRpm / 60.0 * phaseInductanceH;
        double i = current(e3, phaseResistanceOhm, x3PerL0 * l0.ratio());
        double iLow = current(e3, phaseResistanceOhm, x3PerL0 * l0.highRatio());
        double iHigh = current(e3, phaseResistanceOhm, x3PerL0 * l0.lowRatio());
        double loss = 3 * i * i * phaseResistanceOhm;
        double omega = speedRpm * Math.PI / 30;
        return new DeltaCirculation(e3, Math.hypot(phaseResistanceOhm, x3PerL0 * l0.ratio()), i, iLow, iHigh, loss,
                3 * iHigh * iHigh * phaseResistanceOhm, omega > 0 ? loss / omega : 0, l0.basis());
    }

    private static double current(double e3, double r, double x) {
        return e3 / Math.hypot(r, x);
    }
}
