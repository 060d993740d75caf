package coilwright.thermal;

import coilwright.validation.Checks;

/**
 * The surroundings of one operating point.
 *
 * @param speedRpm            alternator speed, rpm, 0 to 20 000 (drives the rotor's own air flow)
 * @param ambientC            ambient air temperature, C, -40 to 60 (default 25)
 * @param externalAirSpeedMs  air speed past the housing along its axis, m/s, 0 to 60 (0 = still air, the
 *                            conservative default; a wind turbine's nacelle sees part of the wind)
 */
public record CoolingConditions(double speedRpm, double ambientC, double externalAirSpeedMs) {
    /** Ambient temperature used when none is given, C. */
    public static final double DEFAULT_AMBIENT_C = 25.0;

    public CoolingConditions {
        new Checks().range("speedRpm", speedRpm, 0, 20_000).range("ambientC", ambientC, -40, 60)
                .range("externalAirSpeedMs", externalAirSpeedMs, 0, 60).throwIfAny();
    }

    /** Still air at 25 C. */
    public static CoolingConditions stillAir(double speedRpm) {
        return new CoolingConditions(speedRpm, DEFAULT_AMBIENT_C, 0);
    }

    /** Mechanical angular speed, rad/s. */
    public double omegaRadS() {
        return speedRpm * Math.PI / 30.0;
    }
}
