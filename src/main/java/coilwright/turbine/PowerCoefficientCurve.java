package coilwright.turbine;

/**
 * A wind rotor's power coefficient Cp as a function of the tip-speed ratio lambda = omega R / v.
 * Cp is 0 at and beyond the runaway (free-spinning) tip-speed ratio and never exceeds the Betz limit.
 * The torque coefficient Cq = Cp / lambda stays finite at lambda = 0, so a rotor held still has a
 * starting torque.
 */
public sealed interface PowerCoefficientCurve permits ParametricCp, TableCp {
    /** Betz limit 16/27 = 0.5926: no open rotor extracts more (source: Betz 1920). */
    double BETZ_LIMIT = 16.0 / 27.0;
    /** Betz limit rounded for messages. */
    String BETZ_TEXT = "0.5926";

    /**
     * @param tipSpeedRatio lambda, >= 0
     * @return Cp, 0 to {@link #BETZ_LIMIT}
     */
    double cp(double tipSpeedRatio);

    /**
     * Torque coefficient Cq = Cp / lambda; at lambda = 0 its limit (the starting-torque coefficient).
     *
     * @param tipSpeedRatio lambda, >= 0
     */
    double torqueCoefficient(double tipSpeedRatio);

    /** The tip-speed ratio at which Cp is largest. */
    double optimumTipSpeedRatio();

    /** The largest Cp of the curve. */
    double maxCp();

    /** The tip-speed ratio above the optimum where Cp falls back to 0: the unloaded runaway. */
    double runawayTipSpeedRatio();

    /** Refuses a negative or non-finite tip-speed ratio. */
    static void checkTipSpeedRatio(double tipSpeedRatio) {
        new coilwright.validation.Checks().nonNegative("tipSpeedRatio", tipSpeedRatio).throwIfAny();
    }
}
