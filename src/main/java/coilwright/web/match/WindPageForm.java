package coilwright.web.match;

import coilwright.system.WindRegime;
import coilwright.system.WindSite;
import coilwright.validation.Checks;

/**
 * The wind match page's form: an example alternator design by its slug, the rotor, the site and the wind.
 *
 * @param example the example design's slug (the page checks it against the example catalogue)
 */
public record WindPageForm(String example, RotorFields rotor, WindSite site, WindRegime wind) {
    public WindPageForm {
        new Checks().present("example", example).present("rotor", rotor).present("site", site).present("wind", wind)
                .throwIfAny();
    }

    static WindPageForm defaults(String example) {
        return new WindPageForm(example, RotorFields.defaults(), WindSite.standard(), WindRegime.rayleigh(5.0));
    }
}
