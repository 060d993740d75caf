package coilwright.rewind;

import coilwright.conductor.Copper;
import coilwright.validation.Checks;

/**
 * What a rewinder measured on the existing machine, with the stated accuracy of each reading.
 *
 * <p>Resistance is taken between two line terminals, because that is what can be measured on a connected
 * machine: for a star connection R_LL = 2 R_ph, for a delta connection R_LL = (2/3) R_ph (one phase in
 * parallel with the other two in series), for a single-phase winding R_LL = R_ph (its two ends).
 *
 * @param openCircuitLineVoltageRmsV  open-circuit voltage between two line terminals (rms), V, &gt; 0 and &lt;= 100000
 * @param measuredSpeedRpm            shaft speed at which the voltage (and frequency) was read, rpm, &gt; 0 and &lt;= 100000
 * @param measuredFrequencyHz         electrical frequency at that speed, Hz, 0 = not measured, else &gt; 0 and &lt;= 10000
 * @param lineResistanceOhm           DC resistance between two line terminals, Ohm, 0 = not measured, else &lt;= 100000
 * @param measuredTemperatureC        copper temperature when the resistance was measured, C, -50 to 250
 * @param lineInductanceH             inductance between two line terminals (an LCR meter at its test frequency),
 *                                    H, 0 = not measured, else &lt;= 10; converted to phase like the resistance
 *                                    (star L_LL = 2 L_ph, delta (2/3) L_ph, single phase L_ph), taken as good to
 *                                    10 % (common practice)
 * @param voltageAccuracyPercent      accuracy of the voltage reading, %, 0 to 50 (default 1 %, common practice
 *                                    for a handheld true-rms meter on AC volts)
 * @param speedAccuracyPercent        accuracy of the speed reading, %, 0 to 50 (default 1 %, common practice
 *                                    for an optical tachometer)
 * @param frequencyAccuracyPercent    accuracy of the frequency reading, %, 0 to 50 (default 0.5 %, common practice)
 * @param resistanceAccuracyPercent   accuracy of the resistance reading, %, 0 to 50 (default 2 %, common
 *                                    practice for a low-ohm reading that includes lead resistance)
 */
public record Measurements(double openCircuitLineVoltageRmsV, double measuredSpeedRpm, double measuredFrequencyHz,
                           double lineResistanceOhm, double measuredTemperatureC, double lineInductanceH,
                           double voltageAccuracyPercent,
                           double speedAccuracyPercent, double frequencyAccuracyPercent,
                           double resistanceAccuracyPercent) {
    public static final double DEFAULT_VOLTAGE_ACCURACY_PERCENT = 1.0;
    public static final double DEFAULT_SPEED_ACCURACY_PERCENT = 1.0;
    public static final double DEFAULT_FREQUENCY_ACCURACY_PERCENT = 0.5;
    public static final double DEFAULT_RESISTANCE_ACCURACY_PERCENT = 2.0;
    static final double MAX_ACCURACY_PERCENT = 50.0;

    public Measurements {
        Checks c = new Checks()
                .rangeExclusiveMin("openCircuitLineVoltageRmsV", openCircuitLineVoltageRmsV, 0, 100_000)
                .rangeExclusiveMin("measuredSpeedRpm", measuredSpeedRpm, 0, 100_000)
                .range("measuredFrequencyHz", measuredFrequencyHz, 0, 10_000)
                .range("lineResistanceOhm", lineResistanceOhm, 0, 100_000)
                .range("measuredTemperatureC", measuredTemperatureC, Copper.MIN_TEMPERATURE_C, Copper.MAX_TEMPERATURE_C)
                .range("lineInductanceH", lineInductanceH, 0, 10)
                .range("voltageAccuracyPercent", voltageAccuracyPercent, 0, MAX_ACCURACY_PERCENT)
                .range("speedAccuracyPercent", speedAccuracyPercent, 0, MAX_ACCURACY_PERCENT)
                .range("frequencyAccuracyPercent", frequencyAccuracyPercent, 0, MAX_ACCURACY_PERCENT)
                .range("resistanceAccuracyPercent", resistanceAccuracyPercent, 0, MAX_ACCURACY_PERCENT);
        c.throwIfAny();
    }

    /**
     * Readings with the default accuracies (voltage 1 %, speed 1 %, frequency 0.5 %, resistance 2 %), no inductance.
     *
     * @param openCircuitLineVoltageRmsV line voltage (rms) at no load, V
     * @param measuredSpeedRpm           speed of that reading, rpm
     * @param measuredFrequencyHz        frequency at that speed, Hz, 0 = not measured
     * @param lineResistanceOhm          resistance between two line terminals, Ohm, 0 = not measured
     * @param measuredTemperatureC       copper temperature of the resistance reading, C
     */
    public static Measurements of(double openCircuitLineVoltageRmsV, double measuredSpeedRpm,
                                  double measuredFrequencyHz, double lineResistanceOhm, double measuredTemperatureC) {
        return new Measurements(openCircuitLineVoltageRmsV, measuredSpeedRpm, measuredFrequencyHz, lineResistanceOhm,
                measuredTemperatureC, 0, DEFAULT_VOLTAGE_ACCURACY_PERCENT, DEFAULT_SPEED_ACCURACY_PERCENT,
                DEFAULT_FREQUENCY_ACCURACY_PERCENT, DEFAULT_RESISTANCE_ACCURACY_PERCENT);
    }

    /** The same readings with a line-to-line inductance, H (0 = not measured). */
    public Measurements withLineInductanceH(double inductanceH) {
        return new Measurements(openCircuitLineVoltageRmsV, measuredSpeedRpm, measuredFrequencyHz, lineResistanceOhm,
                measuredTemperatureC, inductanceH, voltageAccuracyPercent, speedAccuracyPercent,
                frequencyAccuracyPercent, resistanceAccuracyPercent);
    }

    /** True when an inductance was measured. */
    public boolean hasInductance() {
        return lineInductanceH > 0;
    }

    /** True when a frequency was measured. */
    public boolean hasFrequency() {
        return measuredFrequencyHz > 0;
    }

    /** True when a line-to-line resistance was measured. */
    public boolean hasResistance() {
        return lineResistanceOhm > 0;
    }

    /** Pole count implied by the frequency, 2p = 120 f / n, not rounded (0 when no frequency was measured). */
    public double impliedPoles() {
        return 120.0 * measuredFrequencyHz / measuredSpeedRpm;
    }
}
