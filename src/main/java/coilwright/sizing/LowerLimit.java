package coilwright.sizing;

import java.util.Locale;
import java.util.function.ToDoubleFunction;

/**
 * A limit the figure must reach: rated power and efficiency (screened by proven upper bounds), and "charges at all"
 * (the ratio of the highest speed the drive reaches to the cut-in speed, which must exceed 1).
 */
record LowerLimit(String name, String field, String unit, double allowed, String phraseText,
                  ToDoubleFunction<ScreenValues> bound, ToDoubleFunction<FullEvaluation> full) implements Limit {
    @Override
    public boolean upper() {
        return false;
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
