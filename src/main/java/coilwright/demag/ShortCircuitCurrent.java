package coilwright.demag;

import coilwright.validation.Checks;

/**
 * Peak current of a sudden three-phase short circuit at the terminals: steady current I_k = E / |R + jX| and the
 * peak of the first half-cycle, with the DC offset of the worst switching instant, i_p = kappa sqrt(2) I_k,
 * kappa = 1.02 + 0.98 exp(-3 R / X) (IEC 60909-0:2016, eq. 55; kappa tends to 2 as R/X tends to 0, the familiar
 * 2 sqrt(2) E / X). For a surface-magnet machine the synchronous and transient reactances are nearly equal (no
 * damper, large effective gap), so the phase inductance is used for X.
 *
 * @param steadyRmsA   I_k, A rms
 * @param peakFactor   kappa, 1.02 to 2
 * @param peakA        i_p, A
 */
public record ShortCircuitCurrent(double steadyRmsA, double peakFactor, double peakA) {

    /**
     * @param phaseEmfRmsV        open-circuit phase EMF at the speed and magnet temperature, V rms, &gt;= 0
     * @param phaseResistanceOhm  phase resistance, Ohm, &gt; 0
     * @param phaseReactanceOhm   phase reactance at that speed, Ohm, &gt;= 0
     */
    public static ShortCircuitCurrent of(double phaseEmfRmsV, double phaseResistanceOhm, double phaseReactanceOhm) {
        new Checks().nonNegative("phaseEmfRmsV", phaseEmfRmsV).positive("phaseResistanceOhm", phaseResistanceOhm)
                .nonNegative("phaseReactanceOhm", phaseReactanceOhm).throwIfAny();
        double ik = phaseEmfRmsV / Math.hypot(phaseResistanceOhm, phaseReactanceOhm);
        double kappa = phaseReactanceOhm == 0 ? 1.02
                : 1.02 + 0.98 * Math.exp(-3 * phaseResistanceOhm / phaseReactanceOhm);
        return new ShortCircuitCurrent(ik, kappa, kappa * Math.sqrt(2) * ik);
    }
}
