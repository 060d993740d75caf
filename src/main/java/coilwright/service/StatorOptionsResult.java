package coilwright.service;

import coilwright.rewind.PoleOption;
import coilwright.rewind.PoleRanking;
import coilwright.winding.Layers;
import java.util.List;

/**
 * The pole counts a bare stator can be wound for.
 *
 * @param slots    slots or coil positions
 * @param phases   1 or 3
 * @param layers   SINGLE or DOUBLE
 * @param minPoles lowest pole count considered
 * @param maxPoles highest pole count considered
 * @param rankBy   the order of the options
 * @param options  balanced pole counts in that order (empty when none balances)
 */
public record StatorOptionsResult(int slots, int phases, Layers layers, int minPoles, int maxPoles,
                                  PoleRanking rankBy, List<PoleOption> options) {
    public StatorOptionsResult {
        options = List.copyOf(options);
    }

    public static StatorOptionsResult of(StatorOptionsRequest r, List<PoleOption> options) {
        return new StatorOptionsResult(r.slots(), r.phases(), r.layers(), r.minPoles(), r.maxPoles(), r.ranking(),
                options);
    }
}
