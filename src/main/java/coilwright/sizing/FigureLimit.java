package coilwright.sizing;

import java.util.Locale;
import java.util.function.ToDoubleFunction;

/**
 * A limit on one figure, with the screen's bound and the full model's value given as functions: for an upper limit
 * (fill, open-circuit voltage, cut-in speed or wind speed, current density) the bound is exact or a proven lower
 * bound; for a lower limit (rated power, efficiency) a proven upper bound.
 *
 * @param name        short key
 * @param field       the request field that sets it
 * @param unit        unit of the figure ("" for ratios)
 * @param allowed     the limit value
 * @param upper       true: the figure must be at most {@code allowed}; false: at least
 * @param phraseText  what meeting it means, with one %f-style slot for the value
 * @param bound       the screen's bound of the figure
 * @param full        the figure under the full model
 */
record FigureLimit(String name, String field, String unit, double allowed, boolean upper, String phraseText,
                   ToDoubleFunction<ScreenValues> bound, ToDoubleFunction<FullEvaluation> full) implements Limit {

    static FigureLimit atMost(String name, String field, String unit, double allowed, String phraseText,
                              ToDoubleFunction<ScreenValues> bound, ToDoubleFunction<FullEvaluation> full) {
        return new FigureLimit(name, field, unit, allowed, true, phraseText, bound, full);
    }

    static FigureLimit atLeast(String name, String field, String unit, double allowed, String phraseText,
                               ToDoubleFunction<ScreenValues> bound, ToDoubleFunction<FullEvaluation> full) {
        return new FigureLimit(name, field, unit, allowed, false, phraseText, bound, full);
    }

    @Override
    public double screenBound(ScreenValues s) {
        return bound.applyAsDouble(s);
    }

    @Override
    public double figure(FullEvaluation f) {
        return full.applyAsDouble(f);
    }

    @Override
    public String phrase() {
        return String.format(Locale.ROOT, phraseText, allowed);
    }
}
