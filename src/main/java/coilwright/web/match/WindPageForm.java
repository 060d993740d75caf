package coilwright.web.match;

import coilwright.system.WindRegime;
import coilwright.system.WindSite;
import coilwright.validation.Checks;

/**
 * The wind match page's form (the alternator is the design the page carries): the rotor, the site and the wind.
 */
public record WindPageForm(RotorFields rotor, WindSite site, WindRegime wind) {
    public WindPageForm {
        new Checks().present("rotor", rotor).present("site", site).present("wind", wind)
                .throwIfAny();
    }

    static WindPageForm defaults() {
        return new WindPageForm(RotorFields.defaults(), WindSite.standard(), WindRegime.rayleigh(5.0));
    }
}
