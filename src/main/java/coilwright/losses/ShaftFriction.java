package coilwright.losses;

import coilwright.validation.Checks;

import java.util.List;

/**
 * Friction torque on the shaft, running and at break-away, from bearings or as the user measured it.
 *
 * @param runningTorqueNm    friction torque while turning, N m, &gt;= 0 (taken independent of speed, as the SKF
 *                           simplified model does; viscous drag of grease grows with speed and is not modelled)
 * @param breakawayTorqueNm  torque needed to start the shaft from rest, N m, &gt;= runningTorqueNm
 * @param source             how the figures were obtained
 */
public record ShaftFriction(double runningTorqueNm, double breakawayTorqueNm, String source) {
    /** Break-away over running friction of rolling bearings: starting friction can reach about twice the running
     *  value (from memory of bearing makers' guidance). */
    public static final double BREAKAWAY_FACTOR = 2.0;

    public ShaftFriction {
        new Checks().range("runningTorqueNm", runningTorqueNm, 0, 1e4)
                .range("breakawayTorqueNm", breakawayTorqueNm, 0, 1e4).throwIfAny();
        new Checks().require(breakawayTorqueNm >= runningTorqueNm, "breakawayTorqueNm", breakawayTorqueNm,
                "must be at least runningTorqueNm = " + Checks.fmt(runningTorqueNm), ">= runningTorqueNm").throwIfAny();
        source = source == null ? "" : source;
    }

    /** Friction of a set of bearings by the SKF simplified model; break-away {@link #BREAKAWAY_FACTOR} times. */
    public static ShaftFriction ofBearings(List<Bearing> bearings) {
        new Checks().present("bearings", bearings).throwIfAny();
        double m = bearings.stream().mapToDouble(Bearing::frictionTorqueNm).sum();
        return new ShaftFriction(m, BREAKAWAY_FACTOR * m, "SKF simplified model M = 0.5 mu P d, " + bearings.size()
                + " bearing(s); break-away taken as " + Checks.fmt(BREAKAWAY_FACTOR) + " x running (from memory)");
    }

    /** A torque the user measured or chose; break-away equal to it unless given. */
    public static ShaftFriction userTorque(double runningTorqueNm, double breakawayTorqueNm) {
        return new ShaftFriction(runningTorqueNm, Math.max(runningTorqueNm, breakawayTorqueNm), "user value");
    }

    /** Power lost at a speed, W. @param speedRpm shaft speed, rpm, &gt;= 0 */
    public double powerW(double speedRpm) {
        new Checks().nonNegative("speedRpm", speedRpm).throwIfAny();
        return runningTorqueNm * speedRpm * Math.PI / 30.0;
    }
}
