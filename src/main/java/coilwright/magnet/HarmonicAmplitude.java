package coilwright.magnet;

/**
 * One space harmonic of the normal gap flux density.
 *
 * @param order              odd harmonic order v (1 = fundamental)
 * @param amplitudeT         magnitude in tesla, >= 0
 * @param cosineCoefficientT signed cosine coefficient about the pole centre in tesla; negative means the
 *                           harmonic is in antiphase with the fundamental at the pole centre
 */
public record HarmonicAmplitude(int order, double amplitudeT, double cosineCoefficientT) {
    public HarmonicAmplitude {
        if (order < 1 || order % 2 == 0) {
            throw new IllegalArgumentException("order = " + order + ": must be an odd number >= 1");
        }
        if (!Double.isFinite(cosineCoefficientT) || amplitudeT != Math.abs(cosineCoefficientT)) {
            throw new IllegalArgumentException("amplitudeT = " + amplitudeT + ": must equal |cosineCoefficientT| = "
                    + Math.abs(cosineCoefficientT));
        }
    }

    static HarmonicAmplitude of(int order, double cosineCoefficientT) {
        return new HarmonicAmplitude(order, Math.abs(cosineCoefficientT), cosineCoefficientT);
    }
}
