package coilwright.sizing;

import coilwright.conductor.FillCheck;

import java.util.Locale;

/**
 * The coil fill: copper fill in slots, wire fill of air-cored coils, at most the limit; and in any window the
 * enamelled wires' bounding squares must fit (wire fill at most pi/4), or the full model refuses to build the
 * machine. Both figures are the full model's own closed forms ({@link FillCheck}).
 *
 * @param allowed  the limit on the window's own basis
 * @param airCored true when the basis is the wire fill
 */
record FillLimit(double allowed, boolean airCored) implements Limit {
    @Override
    public String name() {
        return "fill";
    }

    @Override
    public String field() {
        return "limits.maxFill";
    }

    @Override
    public String unit() {
        return "";
    }

    @Override
    public boolean upper() {
        return true;
    }

    @Override
    public double screenBound(ScreenValues s) {
        return s.fill;
    }

    @Override
    public boolean screenRejects(ScreenValues s) {
        return excess(s.fill) > SCREEN_MARGIN
                || s.wireFill > FillCheck.SQUARE_PACKING_WIRE_FILL * (1 + SCREEN_MARGIN);
    }

    @Override
    public double figure(FullEvaluation f) {
        return f.fill();
    }

    @Override
    public String phrase() {
        return String.format(Locale.ROOT, airCored ? "winds with a wire fill of at most %.2f"
                : "winds with a copper fill of at most %.2f", allowed);
    }
}
