package coilwright.winding;

import coilwright.validation.Checks;

/**
 * What the winding should be: slots (or air-cored coil positions), poles, phases, layers, coil pitch,
 * parallel paths and skew. Validated field by field; whether the combination can be balanced is decided by
 * {@link StarOfSlots#layout(WindingSpec)}.
 *
 * @param slots            Q, slots or coil positions, 2..400
 * @param poles            2p, magnet poles, even, 2..400
 * @param phases           m, 1 or 3
 * @param layers           single or double layer
 * @param coilPitchSlots   coil pitch y in slots; 0 = automatic (1 for tooth coils where q &lt; 1, else the full
 *                         pitch round(Q/2p)); otherwise 1..Q/2
 * @param parallelPaths    a, parallel paths per phase, 1..Q
 * @param skewSlotPitches  skew of the magnets or slots in slot pitches, 0..2
 */
public record WindingSpec(int slots, int poles, int phases, Layers layers, int coilPitchSlots,
                          int parallelPaths, double skewSlotPitches) {
    public static final int MAX_SLOTS = 400;
    public static final int MAX_POLES = 400;
    public static final double MAX_SKEW_SLOT_PITCHES = 2.0;

    public WindingSpec {
        Checks c = new Checks();
        c.intRange("slots", slots, 2, MAX_SLOTS);
        c.intRange("poles", poles, 2, MAX_POLES);
        c.require(poles % 2 == 0, "poles", poles, "must be even (north and south poles come in pairs)",
                "even, 2 to " + MAX_POLES);
        c.require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3");
        c.present("layers", layers);
        int maxPitch = Math.max(1, slots / 2);
        c.require(coilPitchSlots >= 0 && coilPitchSlots <= maxPitch, "coilPitchSlots", coilPitchSlots,
                "must be 0 (automatic) or 1 to " + maxPitch + " (half the slots)", "0 or 1 to " + maxPitch);
        c.intRange("parallelPaths", parallelPaths, 1, Math.max(1, slots));
        c.range("skewSlotPitches", skewSlotPitches, 0, MAX_SKEW_SLOT_PITCHES);
        c.throwIfAny();
    }

    /** A spec with automatic pitch, one parallel path and no skew. */
    public static WindingSpec of(int slots, int poles, int phases, Layers layers) {
        return new WindingSpec(slots, poles, phases, layers, 0, 1, 0.0);
    }

    /** Pole pairs p = poles / 2. */
    public int polePairs() {
        return poles / 2;
    }

    public WindingSpec withPoles(int newPoles) {
        return new WindingSpec(slots, newPoles, phases, layers, coilPitchSlots, parallelPaths, skewSlotPitches);
    }

    public WindingSpec withLayers(Layers newLayers) {
        return new WindingSpec(slots, poles, phases, newLayers, coilPitchSlots, parallelPaths, skewSlotPitches);
    }

    public WindingSpec withCoilPitchSlots(int newPitch) {
        return new WindingSpec(slots, poles, phases, layers, newPitch, parallelPaths, skewSlotPitches);
    }

    public WindingSpec withParallelPaths(int newPaths) {
        return new WindingSpec(slots, poles, phases, layers, coilPitchSlots, newPaths, skewSlotPitches);
    }

    public WindingSpec withSkewSlotPitches(double newSkew) {
        return new WindingSpec(slots, poles, phases, layers, coilPitchSlots, parallelPaths, newSkew);
    }
}
