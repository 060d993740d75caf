package coilwright.thermal;

import coilwright.conductor.Copper;
import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;

import java.util.function.DoubleFunction;

/**
 * The coupled electro-thermal steady state of one operating point: copper resistance follows the winding
 * temperature (IEC 60028, {@link Copper#resistanceRatio}), the losses heat the winding, and the winding
 * temperature is the fixed point T = T_network(losses(T)). The residual r(T) = T_network(losses(T)) - T is
 * &gt;= 0 at ambient (losses are never negative); it is bracketed by stepping up from the first substitution and
 * solved with Brent's method (Commons Math {@link BrentSolver}). The lowest fixed point is the one reached by a
 * machine warming up from cold, and the bracket is grown from below so that it is the one found.
 */
public final class WindingTemperature {
    /** Highest winding temperature searched, C (the copper model's upper limit). */
    public static final double MAX_WINDING_C = Copper.MAX_TEMPERATURE_C;
    /** Absolute accuracy of the fixed point, K. */
    public static final double ACCURACY_K = 0.01;
    private static final int MAX_EVALUATIONS = 100;

    private WindingTemperature() {
    }

    /**
     * Solves the winding temperature at one operating point.
     *
     * @param model          the machine's thermal network
     * @param conditions     speed, ambient temperature, external air speed
     * @param heatAtWindingC the heat of the operating point evaluated with the copper at a given mean winding
     *                       temperature, C (for a battery load, re-solve the operating point there: the current
     *                       changes with the resistance)
     * @return the fixed point, or {@code settled = false} at {@link #MAX_WINDING_C} when none exists below it
     */
    public static CoupledTemperature solve(ThermalModel model, CoolingConditions conditions,
                                           DoubleFunction<HeatSources> heatAtWindingC) {
        new Checks().present("model", model).present("conditions", conditions).present("heatAtWindingC", heatAtWindingC)
                .throwIfAny();
        int[] calls = {0};
        double ambient = conditions.ambientC();
        UnivariateFunction residual = t -> {
            calls[0]++;
            return model.solve(conditions, heatAtWindingC.apply(t)).windingMeanC() - t;
        };
        double low = ambient;
        double rLow = residual.value(low);
        if (rLow <= ACCURACY_K) {
            return at(model, conditions, heatAtWindingC, low, true, calls[0]);
        }
        double step = Math.max(1.0, rLow);
        double high = Math.min(MAX_WINDING_C, low + 1.5 * step);
        double rHigh = residual.value(high);
        while (rHigh > 0 && high < MAX_WINDING_C) {
            low = high;
            step *= 2;
            high = Math.min(MAX_WINDING_C, high + step);
            rHigh = residual.value(high);
        }
        if (rHigh > 0) {
            return at(model, conditions, heatAtWindingC, MAX_WINDING_C, false, calls[0]);
        }
        try {
            double t = new BrentSolver(ACCURACY_K).solve(MAX_EVALUATIONS, residual, low, high);
            return at(model, conditions, heatAtWindingC, t, true, calls[0]);
        } catch (MathIllegalStateException e) {
            throw new SolverFailedException("windingTempC", "the winding temperature did not converge between "
                    + Checks.fmt(low) + " and " + Checks.fmt(high) + " C", e);
        }
    }

    private static CoupledTemperature at(ThermalModel model, CoolingConditions cc, DoubleFunction<HeatSources> heat,
                                         double windingC, boolean settled, int calls) {
        HeatSources h = heat.apply(windingC);
        return new CoupledTemperature(windingC, model.solve(cc, h), h, settled, calls + 1);
    }
}
