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
}
