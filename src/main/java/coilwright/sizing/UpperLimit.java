package coilwright.sizing;

import java.util.Locale;
import java.util.function.ToDoubleFunction;

/**
 * A limit whose screen bound and full-model figure are given as functions: fill, open-circuit voltage, cut-in speed
 * and cut-in wind speed (exact or proven lower bounds), current density (a proven lower bound).
 */
record UpperLimit(String name, String field, String unit, double allowed, String phraseText,
                  ToDoubleFunction<ScreenValues> bound, ToDoubleFunction<FullEvaluation> full) implements Limit {
    @Override
    public boolean upper() {
        return true;
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
