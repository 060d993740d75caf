package coilwright.sizing;

import coilwright.validation.Checks;

import java.util.OptionalDouble;

/**
 * What every returned design must meet under the full model. A zero means "the default" as stated per field.
 *
 * @param maxCurrentDensityAPerMm2  rms current density in the winding at the rated point, A/mm^2, 0.5 to 30;
 *                                  0 = the top of the cooling's band ({@link coilwright.conductor.Cooling})
 * @param maxFill                   coil fill (copper fill in slots, wire fill of air-cored coils), 0.1 to pi/4;
 *                                  0 = the practical limit of {@link coilwright.conductor.FillCheck}
 * @param minEfficiency             efficiency at the rated point (battery power over shaft power), 0 to 0.99;
 *                                  0 = no minimum
 * @param maxOpenCircuitLineRmsV    open-circuit line voltage at the highest speed, V rms, 1 to 10 000; 0 = stay
 *                                  within extra-low voltage where the battery allows it (see {@link AppliedLimits})
 * @param maxCutInWindSpeedMs       wind drives only: charging must start at or below this wind speed, m/s, 1 to 20;
 *                                  0 = no limit
 * @param maxWindingTempC           optional: the winding's hot spot at the rated point, C, 40 to 250, from the
 *                                  steady thermal network with the losses at that temperature
 *                                  ({@link coilwright.system.MachineLosses}, still air at 25 C); when given and no
 *                                  current density is, it replaces the cooling's current-density band
 * @param maxCoggingPercent         optional: the peak cogging torque as a percentage of the alternator's shaft
 *                                  torque at the rated point, 0.1 to 100 ({@link coilwright.cogging.CoggingCalculator};
 *                                  air-cored stators have none)
 */
public record Limits(double maxCurrentDensityAPerMm2, double maxFill, double minEfficiency,
                     double maxOpenCircuitLineRmsV, double maxCutInWindSpeedMs, OptionalDouble maxWindingTempC,
                     OptionalDouble maxCoggingPercent) {
    /** Highest winding temperature limit, C: above every IEC 60085 class (H is 180 C, 220 and 250 exist). */
    public static final double MAX_WINDING_TEMP_C = 250;

    public Limits {
        Checks c = new Checks();
        zeroOr(c, "maxCurrentDensityAPerMm2", maxCurrentDensityAPerMm2, 0.5, 30);
        zeroOr(c, "maxFill", maxFill, 0.1, Math.PI / 4);
        c.range("minEfficiency", minEfficiency, 0, 0.99);
        zeroOr(c, "maxOpenCircuitLineRmsV", maxOpenCircuitLineRmsV, 1, 10_000);
        zeroOr(c, "maxCutInWindSpeedMs", maxCutInWindSpeedMs, 1, 20);
        maxWindingTempC = maxWindingTempC == null ? OptionalDouble.empty() : maxWindingTempC;
        maxCoggingPercent = maxCoggingPercent == null ? OptionalDouble.empty() : maxCoggingPercent;
        maxWindingTempC.ifPresent(t -> c.range("maxWindingTempC", t, 40, MAX_WINDING_TEMP_C));
        maxCoggingPercent.ifPresent(p -> c.range("maxCoggingPercent", p, 0.1, 100));
        c.throwIfAny();
    }

    /** The limits without a winding-temperature or cogging limit. */
    public Limits(double maxCurrentDensityAPerMm2, double maxFill, double minEfficiency,
                  double maxOpenCircuitLineRmsV, double maxCutInWindSpeedMs) {
        this(maxCurrentDensityAPerMm2, maxFill, minEfficiency, maxOpenCircuitLineRmsV, maxCutInWindSpeedMs,
                OptionalDouble.empty(), OptionalDouble.empty());
    }

    /** A copy with a limit on the winding's hot spot at the rated point, C. */
    public Limits withMaxWindingTempC(double c) {
        return new Limits(maxCurrentDensityAPerMm2, maxFill, minEfficiency, maxOpenCircuitLineRmsV,
                maxCutInWindSpeedMs, OptionalDouble.of(c), maxCoggingPercent);
    }

    /** A copy with a limit on the peak cogging torque, % of the rated shaft torque. */
    public Limits withMaxCoggingPercent(double percent) {
        return new Limits(maxCurrentDensityAPerMm2, maxFill, minEfficiency, maxOpenCircuitLineRmsV,
                maxCutInWindSpeedMs, maxWindingTempC, OptionalDouble.of(percent));
    }

    /** Every limit at its default. */
    public static Limits defaults() {
        return new Limits(0, 0, 0, 0, 0);
    }

    private static void zeroOr(Checks c, String field, double v, double min, double max) {
        if (v != 0) {
            c.require(Double.isFinite(v) && v >= min && v <= max, field, v,
                    "must be 0 (the default) or " + Checks.fmt(min) + " to " + Checks.fmt(max),
                    "0, or " + Checks.fmt(min) + " to " + Checks.fmt(max));
        }
    }
}
