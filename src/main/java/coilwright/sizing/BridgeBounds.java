package coilwright.sizing;

/**
 * Upper bounds on the average DC current a three-phase diode bridge can draw from a balanced sinusoidal source into
 * a battery, whatever the source inductance. They let the screen discard a candidate only when the full model
 * (the bridge's periodic steady state, {@link coilwright.load.LoadSolver}) would discard it too.
 *
 * <p>Circuit, in equivalent-star values: phase EMF e_k (rms E, line-to-line rms E_LL = sqrt(3) E), resistance R per
 * line (winding plus AC cable) and any inductance; diodes with a forward drop V_d; battery V_b behind a resistance
 * R_dc (DC cable and internal resistance). Let a = V_b + 2 V_d and d the average DC current. Averaged over a period
 * the inductances store nothing, so (this project's derivation)
 * <pre>  &lt;sum e_k i_k&gt; = R sum &lt;i_k^2&gt; + a d + R_dc &lt;i_dc^2&gt;.</pre>
 * At every instant the positive line currents flow through the upper diodes and sum to i_dc, the negative ones
 * return it; with at most three lines shared between the two groups, sum i_k^2 &gt;= i_dc^2 (1/1 + 1/2) = 1.5 i_dc^2.
 * With &lt;i_dc^2&gt; &gt;= d^2 the losses are at least (1.5 R + R_dc) d^2 + 2 V_d d. The left side is bounded two ways:
 * <ol>
 * <li>Peak bound: sum e_k i_k &lt;= (max e - min e) i_dc &lt;= sqrt(2) E_LL i_dc, so
 * <pre>  d &lt;= (sqrt(2) E_LL - a) / (1.5 R + R_dc),</pre>
 * zero exactly at the cut-in threshold sqrt(2) E_LL = a.</li>
 * <li>RMS bound: &lt;e_k i_k&gt; &lt;= E I_k (Cauchy-Schwarz); with s = sum I_k &gt;= 2d (each line's rms is at least
 * its mean magnitude, and the magnitudes sum to 2 i_dc) and sum I_k^2 &gt;= max(s^2/3, 1.5 d^2):
 * a d + R_dc d^2 &lt;= max over s &gt;= 2d of [E s - R max(s^2/3, 1.5 d^2)].</li>
 * </ol>
 * The same balance bounds the current by the shaft power (at least (V_b + 2 V_d) d + (1.5 R + R_dc) d^2), the
 * efficiency by V_b / (V_b + 2 V_d + (1.5 R + R_dc) d), and the rms line current from below by d / sqrt(2).
 *
 * <p>A lower bound on the line current, with the inductance L per line (reactance X = omega L): the stored energy
 * W = (L/2) sum i_k^2 lies between (3L/4) i_dc^2 and L i_dc^2 and dW/dt &lt;= i_dc [sqrt(2) E_LL - a -
 * (1.5 R + R_dc) i_dc]; at the maximum of W the bracket is not negative, so the DC current never exceeds
 * (2/sqrt(3)) (sqrt(2) E_LL - a) / (1.5 R + R_dc). The terminals' line-to-line voltage never exceeds the DC side's,
 * a + R_dc i_dc, so its fundamental is at most 4/pi of that peak (a square wave's); the fundamental of the line
 * current then carries at least the rest of the EMF across the line impedance:
 * <pre>  I_rms &gt;= |I_1| / sqrt(2) &gt;= (sqrt(2) E_LL - (4/pi) V_peak) / (sqrt(6) |R + jX|).</pre>
 */
final class BridgeBounds {
    /** Least sum of the squared line currents over the squared DC current. */
    static final double LOSS_FACTOR = 1.5;
    private static final double SQRT2 = Math.sqrt(2);
    /** s at which s^2/3 = 1.5 d^2, per unit of d. */
    private static final double S0 = Math.sqrt(4.5);

    private BridgeBounds() {
    }

    /**
     * Largest average DC current the source can drive, A.
     *
     * @param starEmfRmsV       equivalent-star phase EMF E, V rms
     * @param lineEmfRmsV       line-to-line EMF E_LL, V rms
     * @param thresholdV        a = V_b + 2 V_d, V
     * @param lineResistanceOhm R: equivalent-star winding resistance plus AC cable, per line, Ohm, &gt; 0
     * @param dcResistanceOhm   R_dc: DC cable loop plus battery internal resistance, Ohm, &gt;= 0
     */
    static double maxDcCurrentA(double starEmfRmsV, double lineEmfRmsV, double thresholdV, double lineResistanceOhm,
                                double dcResistanceOhm) {
        double drive = SQRT2 * lineEmfRmsV - thresholdV;
        if (drive <= 0) {
            return 0;
        }
        double quadratic = LOSS_FACTOR * lineResistanceOhm + dcResistanceOhm;
        return Math.min(drive / quadratic, rmsBound(starEmfRmsV, thresholdV, lineResistanceOhm, dcResistanceOhm));
    }

    /** The RMS bound (see the class comment), A. */
    static double rmsBound(double e, double a, double r, double rDc) {
        // the best s is the unconstrained peak 1.5 E / R while it is at least S0 d, else S0 d
        double edge = 1.5 * e / r / S0;
        double beyond = (S0 * e - a) / (rDc + LOSS_FACTOR * r);
        if (beyond > edge) {
            return beyond;
        }
        return Math.min(edge, positiveRoot(rDc, a, 0.75 * e * e / r));
    }

    /**
     * Largest average DC current that a shaft power can supply after the least losses it must cover, A: the root of
     * (1.5 R + R_dc) d^2 + (V_b + 2 V_d) d = shaft power.
     *
     * @param shaftPowerW       power available at the alternator shaft, W
     * @param thresholdV        V_b + 2 V_d, V
     * @param lineResistanceOhm R per line, Ohm
     * @param dcResistanceOhm   R_dc, Ohm
     */
    static double dcCurrentFromShaftPowerA(double shaftPowerW, double thresholdV, double lineResistanceOhm,
                                           double dcResistanceOhm) {
        if (shaftPowerW <= 0) {
            return 0;
        }
        return positiveRoot(LOSS_FACTOR * lineResistanceOhm + dcResistanceOhm, thresholdV, shaftPowerW);
    }

    /** Least rms line current at an average DC current, A: sum I_k^2 &gt;= 1.5 d^2 over three equal lines. */
    static double lineCurrentFromDcA(double dcCurrentA) {
        return dcCurrentA / SQRT2;
    }

    /**
     * Least rms line current at a speed, A (see the class comment); 0 when the EMF cannot drive current past the
     * bridge's voltage.
     *
     * @param lineEmfRmsV       E_LL, V rms
     * @param thresholdV        a = V_b + 2 V_d, V
     * @param lineResistanceOhm R per line, Ohm
     * @param reactanceOhm      X = omega L per line of the equivalent star, Ohm
     * @param dcResistanceOhm   R_dc, Ohm
     */
    static double minLineCurrentRmsA(double lineEmfRmsV, double thresholdV, double lineResistanceOhm,
                                     double reactanceOhm, double dcResistanceOhm) {
        double peakEmf = SQRT2 * lineEmfRmsV;
        double drive = peakEmf - thresholdV;
        if (drive <= 0) {
            return 0;
        }
        double peakDcA = 2 / Math.sqrt(3) * drive / (LOSS_FACTOR * lineResistanceOhm + dcResistanceOhm);
        double left = peakEmf - 4 / Math.PI * (thresholdV + dcResistanceOhm * peakDcA);
        return left <= 0 ? 0 : left / (Math.sqrt(6) * Math.hypot(lineResistanceOhm, reactanceOhm));
    }

    /**
     * Highest efficiency at a DC current between {@code minDcA} and {@code maxDcA} with a line current of at least
     * {@code minLineA}: the losses beyond (V_b + 2 V_d) d are at least (1.5 R + R_dc) d^2 and at least 3 R I^2.
     */
    static double maxEfficiency(double batteryV, double thresholdV, double lineResistanceOhm, double dcResistanceOhm,
                                double minDcA, double maxDcA, double minLineA) {
        double q = LOSS_FACTOR * lineResistanceOhm + dcResistanceOhm;
        double fixedW = 3 * lineResistanceOhm * minLineA * minLineA;
        double d = Math.max(minDcA, Math.min(maxDcA, Math.sqrt(fixedW / q)));
        if (d <= 0) {
            return batteryV / thresholdV;
        }
        return batteryV * d / (thresholdV * d + Math.max(q * d * d, fixedW));
    }

    /** Positive root of q x^2 + b x = c (q &gt;= 0, b &gt; 0, c &gt;= 0), in the form that keeps its digits. */
    static double positiveRoot(double q, double b, double c) {
        if (q <= 0) {
            return c / b;
        }
        return 2 * c / (b + Math.sqrt(b * b + 4 * q * c));
    }
}
