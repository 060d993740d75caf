package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * The standstill torque coefficient Cq0 = Q / (0.5 rho U^2 pi R^3) of a wind rotor held still, by the blade-element
 * estimate of Wood ("A blade element estimation of the cut-in wind speed of a small turbine", Wind Engineering
 * 25(2), 2001): at standstill the wind meets each blade section at incidence 90 deg minus its pitch theta, where the
 * lift and drag of any aerofoil approach those of a flat plate, C_L = 2 sin a cos a; the lift lies in the rotor
 * plane, so
 * <pre>  Q = rho U^2 B integral c r sin(theta) cos(theta) dr   (the "chord-pitch integral")</pre>
 * and Cq0 = (2 B / (pi R^3)) integral c r sin(theta) cos(theta) dr. Most of it comes from the wide, steeply
 * pitched root (Wright &amp; Wood, J. Wind Eng. Ind. Aerodyn. 92, 2004). Wood found such estimates give a start in
 * steady wind somewhat above what gusty field tests show, so a starting wind speed from it errs on the high side.
 * <p>
 * When the blade geometry is unknown, {@link #optimumBlade} assumes the Glauert optimum blade for the rotor's design
 * tip-speed ratio (Manwell, McGowan &amp; Rogers, "Wind Energy Explained", 2nd ed., 2009, section 3.8: flow angle
 * phi = (2/3) atan(1 / lambda_r), chord c = 8 pi r (1 - cos phi) / (B C_L), pitch theta = phi - alpha_design).
 * The low end of a Cp curve, Cq(0) = lim Cp / lambda, is the alternative ({@link #fromCurve}); for slender
 * high-speed blades it is usually several times larger than the blade-element value.
 */
public final class StartingTorque {
    /** Hub radius / tip radius where the blades start, when not given (common practice for small rotors). */
    public static final double DEFAULT_HUB_RATIO = 0.1;
    /** Design lift coefficient of small-turbine aerofoils (from memory: 0.8 to 1.2). */
    public static final double DEFAULT_DESIGN_LIFT_COEFFICIENT = 1.0;
    /** Design angle of attack, degrees (from memory: 4 to 7 for common small-turbine aerofoils). */
    public static final double DEFAULT_DESIGN_ANGLE_OF_ATTACK_DEG = 5.0;

    private StartingTorque() {
    }

    /**
     * Cq0 from a measured or computed chord-pitch integral.
     *
     * @param bladeCount           B, 1 to 12
     * @param radiusM              tip radius R, m
     * @param chordPitchIntegralM3 integral of c r sin(theta) cos(theta) dr over the blade, m^3, &gt;= 0
     */
    public static double fromChordPitchIntegral(int bladeCount, double radiusM, double chordPitchIntegralM3) {
        new Checks().intRange("bladeCount", bladeCount, 1, 12).positive("radiusM", radiusM)
                .nonNegative("chordPitchIntegralM3", chordPitchIntegralM3).throwIfAny();
        return 2 * bladeCount * chordPitchIntegralM3 / (Math.PI * Math.pow(radiusM, 3));
    }

    /**
     * Cq0 of a Glauert-optimum blade designed for a tip-speed ratio (see the class description); independent of
     * size.
     *
     * @param bladeCount               B, 1 to 12
     * @param designTipSpeedRatio      lambda the blades were shaped for, 1 to 15
     * @param designLiftCoefficient    C_L at the design angle, 0.3 to 2
     * @param designAngleOfAttackDeg   alpha_design, 0 to 15 deg
     * @param hubRatio                 blade root radius / tip radius, 0 to 0.5
     */
    public static double optimumBlade(int bladeCount, double designTipSpeedRatio, double designLiftCoefficient,
                                      double designAngleOfAttackDeg, double hubRatio) {
        new Checks().intRange("bladeCount", bladeCount, 1, 12).range("designTipSpeedRatio", designTipSpeedRatio, 1, 15)
                .range("designLiftCoefficient", designLiftCoefficient, 0.3, 2)
                .range("designAngleOfAttackDeg", designAngleOfAttackDeg, 0, 15).range("hubRatio", hubRatio, 0, 0.5)
                .throwIfAny();
        double alpha = Math.toRadians(designAngleOfAttackDeg);
        // unit tip radius: x = r / R; integrand c(x) x sin(theta) cos(theta)
        UnivariateFunction integrand = x -> {
            double lambdaR = designTipSpeedRatio * x;
            double phi = 2.0 / 3.0 * Math.atan2(1, lambdaR);
            double chord = 8 * Math.PI * x * (1 - Math.cos(phi)) / (bladeCount * designLiftCoefficient);
            double theta = phi - alpha;
            return chord * x * Math.sin(theta) * Math.cos(theta);
        };
        double integral;
        try {
            integral = new IterativeLegendreGaussIntegrator(8, 1e-10, 1e-14).integrate(100_000, integrand,
                    Math.max(hubRatio, 1e-6), 1.0);
        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
            throw new SolverFailedException("designTipSpeedRatio", "The blade's chord-pitch integral did not converge ("
                    + e.getMessage() + "); a design tip-speed ratio nearer the common 4 to 8 avoids it.", e);
        }
        return fromChordPitchIntegral(bladeCount, 1.0, integral);
    }

    /** {@link #optimumBlade} with the default design lift, angle of attack and hub ratio. */
    public static double optimumBlade(int bladeCount, double designTipSpeedRatio) {
        return optimumBlade(bladeCount, designTipSpeedRatio, DEFAULT_DESIGN_LIFT_COEFFICIENT,
                DEFAULT_DESIGN_ANGLE_OF_ATTACK_DEG, DEFAULT_HUB_RATIO);
    }

    /** The low-speed end of a Cp curve: Cq(0) = lim Cp / lambda. */
    public static double fromCurve(PowerCoefficientCurve curve) {
        new Checks().present("curve", curve).throwIfAny();
        return curve.torqueCoefficient(0.0);
    }

    /**
     * The coefficient used when the user gives none: the optimum-blade estimate at the curve's optimum tip-speed
     * ratio, but never more than the curve's own Cq(0).
     */
    public static double defaultFor(WindRotor rotor) {
        double blade = optimumBlade(rotor.bladeCount(), Math.max(1, Math.min(15, rotor.curve().optimumTipSpeedRatio())));
        return Math.min(blade, fromCurve(rotor.curve()));
    }
}
