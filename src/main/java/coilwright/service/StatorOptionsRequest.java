package coilwright.service;

import coilwright.rewind.PoleRanking;
import coilwright.validation.Checks;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import java.util.Optional;

/**
 * Body of {@code POST /api/v1/rewind/stator-options}: a bare stator to be fitted with a magnet rotor.
 *
 * @param slots    slots or coil positions, 2..400
 * @param phases   1 or 3
 * @param layers   SINGLE or DOUBLE
 * @param minPoles lowest pole count to consider, 2..400
 * @param maxPoles highest pole count to consider, minPoles..400
 * @param rankBy   the order of the options: WINDING_FACTOR (when absent), COGGING or BALANCED
 */
public record StatorOptionsRequest(int slots, int phases, Layers layers, int minPoles, int maxPoles,
                                   Optional<PoleRanking> rankBy) {
    public StatorOptionsRequest {
        rankBy = rankBy == null ? Optional.empty() : rankBy;
        Checks c = new Checks().intRange("slots", slots, 2, WindingSpec.MAX_SLOTS)
                .require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3")
                .present("layers", layers)
                .intRange("minPoles", minPoles, 2, WindingSpec.MAX_POLES)
                .intRange("maxPoles", maxPoles, 2, WindingSpec.MAX_POLES);
        boolean inRange = minPoles >= 2 && minPoles <= WindingSpec.MAX_POLES && maxPoles >= 2
                && maxPoles <= WindingSpec.MAX_POLES;
        if (inRange) {
            c.require(minPoles <= maxPoles, "maxPoles", maxPoles, "must be >= minPoles (" + minPoles + ")",
                    ">= minPoles");
        }
        c.throwIfAny();
    }

    /** The ranking asked for, winding factor first when none was. */
    public PoleRanking ranking() {
        return rankBy.orElse(PoleRanking.WINDING_FACTOR);
    }
}
