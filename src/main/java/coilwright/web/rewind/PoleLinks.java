package coilwright.web.rewind;

import coilwright.rewind.PoleOption;
import coilwright.service.StatorOptionsResult;

/** For templates: the design-form link of one pole option ({@code ${poleLinks.design(result, option)}}). */
public final class PoleLinks {
    PoleLinks() {
    }

    public String design(StatorOptionsResult result, PoleOption option) {
        return DesignLinks.statorOption(result.slots(), result.phases(), result.layers(), option);
    }

    /** The winding page for this pole count. */
    public String layout(StatorOptionsResult result, PoleOption option) {
        return "/winding?slots=" + result.slots() + "&poles=" + option.poles() + "&phases=" + result.phases()
                + "&layers=" + result.layers().name();
    }

    /** The magnetic pull of an option in words: balanced and how many-fold, or one-sided. */
    public String pull(PoleOption option) {
        return coilwright.rewind.PoleRanking.pullBalanced(option) ? "balanced, " + option.gcdSlotsPoles() + "-fold"
                : "one-sided";
    }
}
