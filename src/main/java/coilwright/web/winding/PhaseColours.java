package coilwright.web.winding;

import java.util.List;
import java.util.Locale;

/**
 * The colours the winding drawings give the phases. Chosen to stay apart in grey print and for red-green colour
 * blindness, and dark enough to carry white letters; every drawing names the phase by its letter as well, so the
 * colour is never the only cue.
 */
public final class PhaseColours {
    /** Phases A, B, C (index 0, 1, 2): copper brown, steel blue, moss green. */
    public static final List<String> FILLS = List.of("#b3470f", "#1f5fa8", "#2d7a3a");

    private PhaseColours() {
    }

    /** The fill of phase index 0..2. */
    public static String of(int phase) {
        return FILLS.get(phase);
    }

    /** The CSS class of a phase letter, {@code phase-a}, used by the swatches of the page legend. */
    public static String cssClass(String phaseLetter) {
        return "phase-" + phaseLetter.toLowerCase(Locale.ROOT);
    }
}
