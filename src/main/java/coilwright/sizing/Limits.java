package coilwright.sizing;

import coilwright.validation.Checks;

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
 */
public record Limits(double maxCurrentDensityAPerMm2, double maxFill, double minEfficiency,
                     double maxOpenCircuitLineRmsV, double maxCutInWindSpeedMs) {
    public Limits {
        Checks c = new Checks();
        zeroOr(c, "maxCurrentDensityAPerMm2", maxCurrentDensityAPerMm2, 0.5, 30);
        zeroOr(c, "maxFill", maxFill, 0.1, Math.PI / 4);
        c.range("minEfficiency", minEfficiency, 0, 0.99);
        zeroOr(c, "maxOpenCircuitLineRmsV", maxOpenCircuitLineRmsV, 1, 10_000);
        zeroOr(c, "maxCutInWindSpeedMs", maxCutInWindSpeedMs, 1, 20);
        c.throwIfAny();
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
