package coilwright.winding;

/**
 * Winding and skew factors of one odd harmonic of the EMF.
 *
 * @param order          harmonic order v (odd, 1..13)
 * @param windingFactor  kw_v, 0..1: distribution and pitch together (star of slots)
 * @param skewFactor     |sin(v*s/2) / (v*s/2)|, 0..1, s the skew in electrical radians; 1 without skew
 * @param totalFactor    windingFactor * skewFactor
 */
public record HarmonicFactor(int order, double windingFactor, double skewFactor, double totalFactor) {
    public HarmonicFactor {
        if (order < 1 || !(windingFactor >= 0 && windingFactor <= 1 + 1e-12)
                || !(skewFactor >= 0 && skewFactor <= 1 + 1e-12) || !Double.isFinite(totalFactor)) {
            throw new IllegalArgumentException("inconsistent harmonic factor: order " + order + ", kw "
                    + windingFactor + ", ks " + skewFactor);
        }
    }
}
