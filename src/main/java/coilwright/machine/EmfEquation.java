package coilwright.machine;

/**
 * The EMF equation of an AC machine with a sinusoidally distributed flux:
 * E_ph,rms = sqrt(2) pi f N_ph kw Phi (Faraday's law applied to the flux linkage N_ph kw Phi sin(wt); the
 * textbook form 4.44 f N Phi kw rounds sqrt(2) pi = 4.4429). Frequency f = p n / 60.
 */
public final class EmfEquation {

    /** sqrt(2) * pi. */
    public static final double SQRT2_PI = Math.sqrt(2) * Math.PI;

    private EmfEquation() {
    }

    /**
     * @param frequencyHz          electrical frequency, Hz
     * @param seriesTurnsPerPhase  series turns per phase N_ph
     * @param windingFactor        fundamental winding factor kw (with skew)
     * @param fluxPerPoleWb        fundamental flux per pole, Wb
     * @return rms phase EMF, V
     */
    public static double phaseRmsV(double frequencyHz, double seriesTurnsPerPhase, double windingFactor, double fluxPerPoleWb) {
        return SQRT2_PI * frequencyHz * seriesTurnsPerPhase * windingFactor * fluxPerPoleWb;
    }

    /** Electrical frequency f = p n / 60 for p pole pairs at n rpm, Hz. */
    public static double frequencyHz(int polePairs, double speedRpm) {
        return polePairs * speedRpm / 60.0;
    }
}
