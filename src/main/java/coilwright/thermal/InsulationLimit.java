package coilwright.thermal;

import coilwright.validation.Checks;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

/**
 * Where along an operating curve the winding reaches its insulation class limit (IEC 60085 hot-spot limits,
 * {@link coilwright.conductor.ThermalClass#limitC()}). The curve is any function of a speed-like variable
 * (alternator rpm, or wind speed for a matched wind turbine) returning the steady hot-spot temperature there.
 * The range is scanned in {@link #SCAN_STEPS} steps for the first crossing, which is then refined by Brent's method.
 */
public final class InsulationLimit {
    /** Scan steps across the range before refining. */
    public static final int SCAN_STEPS = 24;
    /** Absolute accuracy of the crossing, in the unit of the curve's variable. */
    public static final double RELATIVE_ACCURACY = 1e-4;
    private static final int MAX_EVALUATIONS = 100;

    private InsulationLimit() {
    }

    /**
     * The lowest value in [low, high] at which the hot spot reaches {@code limitC}.
     *
     * @param hotSpotAt  hot-spot winding temperature, C, as a function of the curve's variable
     * @param low        start of the range (e.g. cut-in speed)
     * @param high       end of the range (e.g. top of the matched curve), &gt; low
     * @param limitC     the insulation class limit, C
     * @return the crossing, or empty when the whole range stays below the limit; {@code low} when already above
     */
    public static OptionalDouble firstCrossing(DoubleUnaryOperator hotSpotAt, double low, double high, double limitC) {
        new Checks().present("hotSpotAt", hotSpotAt).nonNegative("low", low).positive("high", high)
                .range("limitC", limitC, 50, 250).throwIfAny();
        new Checks().require(high > low, "high", high, "must exceed low = " + Checks.fmt(low), "> low").throwIfAny();
        UnivariateFunction excess = x -> hotSpotAt.applyAsDouble(x) - limitC;
        double a = low;
        double fa = excess.value(a);
        if (fa >= 0) {
            return OptionalDouble.of(low);
        }
        for (int i = 1; i <= SCAN_STEPS; i++) {
            double b = low + (high - low) * i / SCAN_STEPS;
            double fb = excess.value(b);
            if (fb >= 0) {
                double tol = RELATIVE_ACCURACY * (high - low);
                return OptionalDouble.of(new BrentSolver(tol).solve(MAX_EVALUATIONS, excess, a, b));
            }
            a = b;
        }
        return OptionalDouble.empty();
    }
}
