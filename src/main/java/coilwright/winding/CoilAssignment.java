package coilwright.winding;

import coilwright.validation.InfeasibleDesignException;

import java.util.ArrayList;
import java.util.List;

/** Builds the coils of a layout and gives each a phase and polarity by the sectors of the star of slots. */
final class CoilAssignment {
    private CoilAssignment() {
    }

    static List<Coil> assign(WindingSpec spec, int pitch, SlotStar star) {
        int slots = spec.slots();
        int m = spec.phases();
        if (spec.layers() == Layers.SINGLE && pitch % 2 == 0) {
            return pairedBelts(spec, pitch, star);
        }
        // double layer: a coil starts in every slot; single layer, odd pitch: in every other slot
        int step = spec.layers() == Layers.DOUBLE ? 1 : 2;
        int count = spec.layers().coilCount(slots);
        int[] angles = new int[count];
        for (int k = 0; k < count; k++) {
            angles[k] = star.angleUnits(k * step, 1);
        }
        int[] sector = SlotStar.sectors(angles, slots, m);
        List<Coil> coils = new ArrayList<>(count);
        for (int k = 0; k < count; k++) {
            int go = k * step;
            coils.add(new Coil(k + 1, go + 1, (go + pitch) % slots + 1, SlotStar.phaseOf(sector[k], m),
                    SlotStar.polarityOf(sector[k], m)));
        }
        return coils;
    }

    /**
     * Single layer with an even pitch spanning 180 electrical degrees: every slot is put in a phase belt by its
     * own phasor; each slot of a positive belt starts a coil that returns in the opposite (negative) belt.
     */
    private static List<Coil> pairedBelts(WindingSpec spec, int pitch, SlotStar star) {
        int slots = spec.slots();
        int m = spec.phases();
        int[] angles = new int[slots];
        for (int k = 0; k < slots; k++) {
            angles[k] = star.angleUnits(k, 1);
        }
        int[] sector = SlotStar.sectors(angles, slots, m);
        List<Coil> coils = new ArrayList<>(slots / 2);
        for (int k = 0; k < slots; k++) {
            if (SlotStar.polarityOf(sector[k], m) < 0) {
                continue;
            }
            int ret = (k + pitch) % slots;
            int phase = SlotStar.phaseOf(sector[k], m);
            if (SlotStar.phaseOf(sector[ret], m) != phase || SlotStar.polarityOf(sector[ret], m) > 0) {
                throw new InfeasibleDesignException("coilPitchSlots", Feasibility.describe(spec)
                        + ", single layer: slot " + (ret + 1) + " is not in the opposite belt of slot " + (k + 1)
                        + ", so coils of pitch " + pitch + " cannot pair the belts");
            }
            coils.add(new Coil(coils.size() + 1, k + 1, ret + 1, phase, 1));
        }
        if (coils.size() * 2 != slots) {
            throw new InfeasibleDesignException("slots", Feasibility.describe(spec)
                    + ", single layer: the positive and negative phase belts do not hold equal numbers of slots");
        }
        return coils;
    }
}
