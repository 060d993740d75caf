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
    /**
     * A secant step from a point of {@link #solveNear} at most this long accepts the point, K: a tenth of
     * {@link #ACCURACY_K}, so the answer lies within the bracketing solve's own accuracy of the fixed point.
     */
    static final double SECANT_STEP_K = ACCURACY_K / 10;
    /** Loss evaluations {@link #solveNear} tries before it falls back to the bracketing solve. */
    static final int MAX_SECANT_EVALUATIONS = 8;

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

    /**
     * The same fixed point as {@link #solve}, to its accuracy, found from a winding temperature near the answer by the
     * secant method on the residual r(T) = T_network(losses(T)) - T: the first step is the plain substitution
     * T_1 = T_network(losses(T_0)), the later ones the secant through the last two points (super-linear; the residual
     * is smooth and nearly linear, since the losses change with the copper resistance only). Each loss evaluation is
     * one re-solve of the operating point, which dominates the cost, so this takes two or three instead of the eight
     * or more of the bracketing solve. A point is accepted when the secant step from it is at most
     * {@link #SECANT_STEP_K} and the residual falls through zero there (a stable fixed point, as a machine warming
     * up settles at). Anything else (a residual that does not fall, a step leaving ambient to
     * {@link #MAX_WINDING_C}, no convergence within {@link #MAX_SECANT_EVALUATIONS}) falls back to {@link #solve},
     * which brackets from ambient and also reports thermal runaway.
     *
     * @param startC      a winding temperature near the answer, C (clamped to ambient .. {@link #MAX_WINDING_C})
     */
    public static CoupledTemperature solveNear(ThermalModel model, CoolingConditions conditions,
                                               DoubleFunction<HeatSources> heatAtWindingC, double startC) {
        new Checks().present("model", model).present("conditions", conditions).present("heatAtWindingC", heatAtWindingC)
                .range("startC", startC, -1e6, 1e6).throwIfAny();
        double ambient = conditions.ambientC();
        double t0 = Math.max(ambient, Math.min(MAX_WINDING_C, startC));
        HeatSources h0 = heatAtWindingC.apply(t0);
        ThermalSolution s0 = model.solve(conditions, h0);
        double r0 = s0.windingMeanC() - t0;
        int calls = 1;
        if (r0 == 0) {
            return new CoupledTemperature(t0, s0, h0, true, calls);
        }
        double t1 = t0 + r0;
        while (calls < MAX_SECANT_EVALUATIONS && t1 >= ambient && t1 <= MAX_WINDING_C) {
            HeatSources h1 = heatAtWindingC.apply(t1);
            ThermalSolution s1 = model.solve(conditions, h1);
            calls++;
            double r1 = s1.windingMeanC() - t1;
            double slope = (r1 - r0) / (t1 - t0);
            if (!(slope < 0) || !Double.isFinite(slope)) {
                break;
            }
            double step = -r1 / slope;
            if (Math.abs(step) <= SECANT_STEP_K) {
                return new CoupledTemperature(t1, s1, h1, true, calls);
            }
            t0 = t1;
            r0 = r1;
            t1 += step;
        }
        CoupledTemperature full = solve(model, conditions, heatAtWindingC);
        return new CoupledTemperature(full.windingMeanC(), full.solution(), full.heat(), full.settled(),
                full.evaluations() + calls);
    }

    private static CoupledTemperature at(ThermalModel model, CoolingConditions cc, DoubleFunction<HeatSources> heat,
                                         double windingC, boolean settled, int calls) {
        HeatSources h = heat.apply(windingC);
        return new CoupledTemperature(windingC, model.solve(cc, h), h, settled, calls + 1);
    }
}
