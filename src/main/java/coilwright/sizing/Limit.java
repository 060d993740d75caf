package coilwright.sizing;

import java.util.Locale;

/**
 * One requirement every returned design meets under the full model. The screen asks each limit for a bound of its
 * figure from the closed forms, a lower bound for an upper limit and an upper bound for a lower limit, exact where
 * the closed form is the full model's own; it discards a candidate only when that bound already breaks the limit,
 * so the full model would break it too. A later model (a winding temperature from a thermal network) replaces a
 * limit by implementing this interface.
 */
interface Limit {
    /** Relative margin under which a screened bound is not trusted to reject (rounding of the closed forms). */
    double SCREEN_MARGIN = 1e-9;

    /** Short key, e.g. {@code currentDensity}. */
    String name();

    /** The request field that sets the limit, e.g. {@code limits.maxCurrentDensityAPerMm2}. */
    String field();

    /** Unit of the figure, e.g. {@code A/mm^2}. */
    String unit();

    /** The limit value. */
    double allowed();

    /** True for an upper limit (figure at most {@link #allowed()}), false for a lower one. */
    boolean upper();

    /** The closed-form bound of the figure for a candidate (see the class comment). */
    double screenBound(ScreenValues s);

    /** The figure under the full model. */
    double figure(FullEvaluation f);

    /** What meeting the limit means, in words: "at most 5.0 A/mm^2 at the rated point". */
    String phrase();

    /** Relative excess of a figure over the limit: &gt; 0 when it is broken. */
    default double excess(double figure) {
        return upper() ? (figure - allowed()) / allowed() : (allowed() - figure) / allowed();
    }

    /** The screen's verdict: true only when the candidate provably breaks the limit. */
    default boolean screenRejects(ScreenValues s) {
        return excess(screenBound(s)) > SCREEN_MARGIN;
    }

    /** The full model's verdict. */
    default boolean rejects(FullEvaluation f) {
        return excess(figure(f)) > 0;
    }

    /** The figure with its unit. */
    default String format(double figure) {
        if (!Double.isFinite(figure)) {
            return "never";
        }
        String number = String.format(Locale.ROOT, "%.3g", figure);
        return unit().isEmpty() ? number : number + " " + unit();
    }
}
