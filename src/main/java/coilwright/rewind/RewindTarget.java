package coilwright.rewind;

import coilwright.conductor.Copper;
import coilwright.validation.Checks;

/**
 * What the reconnected or rewound machine should do, and where to evaluate it.
 * <ul>
 * <li>{@link Kind#BATTERY_CUT_IN}: start charging a battery of {@code batteryVoltageV} at {@code cutInSpeedRpm}
 * through a bridge rectifier with two diodes of {@code diodeDropV} in series in the current path.</li>
 * <li>{@link Kind#LINE_VOLTAGE}: an open-circuit line voltage of {@code lineVoltageRmsV} (rms) at
 * {@code voltageSpeedRpm}.</li>
 * </ul>
 * Fields of the other kind are ignored and may be 0.
 *
 * @param kind                 which of the two targets
 * @param batteryVoltageV      battery voltage at which charging should start, V, &gt; 0 and &lt;= 1000 (battery kind)
 * @param cutInSpeedRpm        wanted cut-in speed, rpm, &gt; 0 and &lt;= 100000 (battery kind)
 * @param diodeDropV           forward drop of one rectifier diode, V, 0 to 5 (battery kind; 0.8 V silicon is usual)
 * @param lineVoltageRmsV      wanted open-circuit line voltage (rms), V, &gt; 0 and &lt;= 100000 (voltage kind)
 * @param voltageSpeedRpm      speed of that voltage, rpm, &gt; 0 and &lt;= 100000 (voltage kind)
 * @param targetSpeedRpm       speed at which output, current and copper loss are estimated (e.g. rated), rpm,
 *                             &gt; 0 and &lt;= 100000
 * @param windingTemperatureC  copper temperature for resistance, current and copper loss, C, -50 to 250
 */
public record RewindTarget(Kind kind, double batteryVoltageV, double cutInSpeedRpm, double diodeDropV,
                           double lineVoltageRmsV, double voltageSpeedRpm, double targetSpeedRpm,
                           double windingTemperatureC) {
    /** Forward drop of a silicon power diode, V (common practice). */
    public static final double SILICON_DIODE_DROP_V = 0.8;
    /** Temperature used when none is stated: a warm winding, C (common practice). */
    public static final double DEFAULT_WINDING_TEMPERATURE_C = 60.0;

    /** The kind of target. */
    public enum Kind { BATTERY_CUT_IN, LINE_VOLTAGE }

    public RewindTarget {
        Checks c = new Checks().present("kind", kind);
        if (kind == Kind.BATTERY_CUT_IN) {
            c.rangeExclusiveMin("batteryVoltageV", batteryVoltageV, 0, 1000)
                    .rangeExclusiveMin("cutInSpeedRpm", cutInSpeedRpm, 0, 100_000)
                    .range("diodeDropV", diodeDropV, 0, 5);
        } else if (kind == Kind.LINE_VOLTAGE) {
            c.rangeExclusiveMin("lineVoltageRmsV", lineVoltageRmsV, 0, 100_000)
                    .rangeExclusiveMin("voltageSpeedRpm", voltageSpeedRpm, 0, 100_000);
        }
        c.rangeExclusiveMin("targetSpeedRpm", targetSpeedRpm, 0, 100_000)
                .range("windingTemperatureC", windingTemperatureC, Copper.MIN_TEMPERATURE_C, Copper.MAX_TEMPERATURE_C);
        c.throwIfAny();
    }

    /** Battery target with silicon diodes ({@value #SILICON_DIODE_DROP_V} V) and a 60 C winding. */
    public static RewindTarget battery(double batteryVoltageV, double cutInSpeedRpm, double targetSpeedRpm) {
        return new RewindTarget(Kind.BATTERY_CUT_IN, batteryVoltageV, cutInSpeedRpm, SILICON_DIODE_DROP_V, 0, 0,
                targetSpeedRpm, DEFAULT_WINDING_TEMPERATURE_C);
    }

    /** Line-voltage target with a 60 C winding. */
    public static RewindTarget lineVoltage(double lineVoltageRmsV, double voltageSpeedRpm, double targetSpeedRpm) {
        return new RewindTarget(Kind.LINE_VOLTAGE, 0, 0, 0, lineVoltageRmsV, voltageSpeedRpm, targetSpeedRpm,
                DEFAULT_WINDING_TEMPERATURE_C);
    }

    /** The same target evaluated at another winding temperature, C. */
    public RewindTarget withWindingTemperatureC(double temperatureC) {
        return new RewindTarget(kind, batteryVoltageV, cutInSpeedRpm, diodeDropV, lineVoltageRmsV, voltageSpeedRpm,
                targetSpeedRpm, temperatureC);
    }

    /**
     * The line Ke (rms V/rpm) that meets the target exactly. Battery: sqrt(2) Ke n_cut-in = Vb + 2 Vd (the peak
     * line EMF reaches the battery plus two diode drops). Voltage: V / n.
     */
    public double wantedKeLineRmsVPerRpm() {
        return kind == Kind.BATTERY_CUT_IN
                ? CutInSpeed.keLineForCutIn(cutInSpeedRpm, batteryVoltageV, diodeDropV)
                : lineVoltageRmsV / voltageSpeedRpm;
    }

    /**
     * What a machine of line constant keLine achieves on this target's measure: the cut-in speed (rpm) for a
     * battery target, the open-circuit line voltage at voltageSpeedRpm (V) for a voltage target.
     */
    public double achieved(double keLineRmsVPerRpm) {
        return kind == Kind.BATTERY_CUT_IN
                ? CutInSpeed.speedRpm(keLineRmsVPerRpm, batteryVoltageV, diodeDropV)
                : keLineRmsVPerRpm * voltageSpeedRpm;
    }

    /** The wanted value of the target's measure: the cut-in speed (rpm) or the line voltage (V). */
    public double wanted() {
        return kind == Kind.BATTERY_CUT_IN ? cutInSpeedRpm : lineVoltageRmsV;
    }
}
