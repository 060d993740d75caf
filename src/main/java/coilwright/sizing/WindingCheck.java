package coilwright.sizing;

import coilwright.validation.InfeasibleDesignException;
import coilwright.winding.Layers;
import coilwright.winding.StarOfSlots;
import coilwright.winding.WindingSpec;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Which slot (coil) and pole counts make a usable three-phase winding, by the star of slots; each count pair and
 * layer is laid out once per search. Not thread-safe: used while the layouts are drafted.
 */
final class WindingCheck {
    private final double minWindingFactor;
    private final Map<WindingSpec, Optional<LayoutRejection>> verdicts = new HashMap<>();

    WindingCheck(double minWindingFactor) {
        this.minWindingFactor = minWindingFactor;
    }

    /** The spec with automatic pitch, one path and no skew. */
    static WindingSpec spec(int slots, int poles, Layers layers) {
        return WindingSpec.of(slots, poles, 3, layers);
    }

    /** Empty when the winding can be laid out balanced with kw1 at or above the floor. */
    Optional<LayoutRejection> rejection(WindingSpec spec) {
        return verdicts.computeIfAbsent(spec, s -> {
            try {
                double kw1 = StarOfSlots.layout(s).fundamentalTotalFactor();
                return kw1 < minWindingFactor ? Optional.of(LayoutRejection.WINDING_FACTOR_BELOW_FLOOR) : Optional.empty();
            } catch (InfeasibleDesignException e) {
                // unbalanced, or a winding factor below the useful minimum of the star of slots
                return Optional.of(LayoutRejection.WINDING_NOT_BALANCED);
            }
        });
    }
}
