package coilwright.magnet;

/**
 * Two-dimensional harmonic (Fourier) field of a magnet array on infinitely permeable smooth iron facing smooth
 * iron across a gap; linear materials, curvature ignored. The magnet layer (thickness l_m, relative recoil
 * permeability mu_r) carries a normal remanence that is +Br over a pole arc alpha_p * tau_p and alternates
 * from pole to pole; its Fourier series has only odd orders v with cosine coefficients
 * Br_v = (4 / (v pi)) Br sin(v alpha_p pi / 2).
 *
 * <p>Derivation (magnetic scalar potential, H = -grad phi, phi = 0 on both iron surfaces): with k = v pi / tau_p,
 * phi = A sinh(k (y + l_m)) cos(kx) in the magnet (-l_m &lt; y &lt; 0) and phi = C sinh(k (g - y)) cos(kx) in the
 * gap (0 &lt; y &lt; g). Continuity of phi and of B_y = mu0 mu_r H_y + Br_v (magnet) = mu0 H_y (gap) at y = 0 gives
 * the normal flux density at the facing iron surface
 * <pre>
 *   B_v = Br_v sinh(k l_m) / (mu_r cosh(k l_m) sinh(k g) + sinh(k l_m) cosh(k g))
 *       = Br_v / (cosh(k g) + mu_r sinh(k g) / tanh(k l_m))
 * </pre>
 * and B_y(d) = B_v cosh(k d) at distance d from that surface. As k -&gt; 0 (tau_p / g -&gt; infinity) this tends to
 * Br_v l_m / (l_m + mu_r g), the 1-D magnetic circuit times the square-wave Fourier coefficient. This is the
 * formula in DESIGN.md section 3, rewritten in a form that cannot overflow.
 *
 * <p>A symmetric dual rotor (two such arrays facing N to S) has B_x = 0 on the mid-plane by symmetry, so the
 * mid-plane acts as the iron surface with g = G / 2. The average of cosh(k d) over a layer of thickness h
 * centred on the mid-plane is sinh(k h / 2) / (k h / 2).
 * Method: the standard harmonic solution of surface-magnet fields, e.g. Zhu, Howe, Bolte &amp; Ackermann,
 * IEEE Trans. Magnetics 29(1), 1993 (here in Cartesian form).
 */
public final class HarmonicGapField {

    private HarmonicGapField() {
    }

    /** Cosine coefficient of order v of the alternating remanence pattern: (4/(v pi)) Br sin(v alpha_p pi/2), T. */
    public static double remanenceHarmonicT(int order, double remanenceT, double poleArcRatio) {
        return 4.0 / (order * Math.PI) * remanenceT * Math.sin(order * poleArcRatio * Math.PI / 2.0);
    }

    /**
     * Cosine coefficient of the normal flux density of odd order v, averaged over a layer of thickness
     * {@code 2 * halfLayerM} centred on the iron surface (or symmetry plane) at distance {@code gapM} from the
     * magnet face. {@code halfLayerM = 0} gives the value on the surface itself.
     *
     * @param order              odd harmonic order v >= 1
     * @param remanenceT         Br in tesla
     * @param recoilPermeability relative recoil permeability mu_r
     * @param poleArcRatio       alpha_p in (0, 1]
     * @param polePitchM         tau_p in metres
     * @param magnetThicknessM   l_m in metres
     * @param gapM               magnet face to iron surface (or symmetry plane) in metres
     * @param halfLayerM         half thickness of the averaging layer, 0 <= halfLayerM <= gapM
     * @return signed cosine coefficient in tesla (negative: in antiphase with the fundamental at the pole centre)
     */
    public static double normalFluxDensityT(int order, double remanenceT, double recoilPermeability,
                                            double poleArcRatio, double polePitchM, double magnetThicknessM,
                                            double gapM, double halfLayerM) {
        double k = order * Math.PI / polePitchM;
        double kg = k * gapM;
        double x = k * halfLayerM;
        double c = recoilPermeability / Math.tanh(k * magnetThicknessM);
        // sinh(x) / x / (cosh(kg) + c sinh(kg)) with every exponential scaled by exp(-kg) so that nothing overflows.
        double e2g = Math.exp(-2.0 * kg);
        double denominator = (1.0 + e2g) + c * (-Math.expm1(-2.0 * kg));
        double layerFactor = x == 0.0 ? 1.0 : -Math.expm1(-2.0 * x) / (2.0 * x);
        return remanenceHarmonicT(order, remanenceT, poleArcRatio) * 2.0 * Math.exp(x - kg) * layerFactor
                / denominator;
    }

    /** 1-D square-wave fundamental: (4/pi) Bg sin(alpha_p pi/2), T. */
    public static double squareWaveFundamentalT(double flatTopT, double poleArcRatio) {
        return 4.0 / Math.PI * flatTopT * Math.sin(poleArcRatio * Math.PI / 2.0);
    }
}
