package coilwright.machine;

/**
 * One odd harmonic of the phase EMF relative to the fundamental.
 *
 * @param order                 harmonic order v (odd)
 * @param windingFactor         kw_v including skew
 * @param fluxDensityRatio      B_v / B_1 of the gap field
 * @param emfRatio              E_v / E_1 of the phase EMF
 */
public record EmfHarmonic(int order, double windingFactor, double fluxDensityRatio, double emfRatio) {
}
