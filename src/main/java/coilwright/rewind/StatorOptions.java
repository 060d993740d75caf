package coilwright.rewind;

import coilwright.winding.HarmonicFactor;
import coilwright.winding.Layers;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;

import java.util.List;

/** For a stator to be fitted with a magnet rotor: the pole counts its slots can be wound for. */
public final class StatorOptions {
    private StatorOptions() {
    }

    /**
     * Every even pole count in [minPoles, maxPoles] that gives a balanced winding on the slots (star of slots;
     * Cros and Viarouge 2002, Bianchi and Dai Pre 2006), highest fundamental winding factor first, then the higher
     * LCM(Q, 2p) (less cogging): {@link #forSlots(int, int, Layers, int, int, PoleRanking)} with
     * {@link PoleRanking#WINDING_FACTOR}.
     *
     * @throws coilwright.validation.InvalidInputException for values out of range, naming the field
     */
    public static List<PoleOption> forSlots(int slots, int phases, Layers layers, int minPoles, int maxPoles) {
        return forSlots(slots, phases, layers, minPoles, maxPoles, PoleRanking.WINDING_FACTOR);
    }

    /**
     * Every even pole count in [minPoles, maxPoles] that gives a balanced winding on the slots, in the order asked.
     *
     * @param slots    slots or coil positions, 2..400
     * @param phases   1 or 3
     * @param layers   single or double layer
     * @param minPoles lowest pole count, 2..400
     * @param maxPoles highest pole count, minPoles..400
     * @param ranking  the order of the list
     * @return the feasible pole counts (empty when none)
     * @throws coilwright.validation.InvalidInputException for values out of range, naming the field
     */
    public static List<PoleOption> forSlots(int slots, int phases, Layers layers, int minPoles, int maxPoles,
                                            PoleRanking ranking) {
        new coilwright.validation.Checks().present("layers", layers).present("rankBy", ranking).throwIfAny();
        return ranking.sort(StarOfSlots.feasiblePoleCounts(slots, phases, layers, minPoles, maxPoles).stream()
                .map(StatorOptions::option).toList());
    }

    private static PoleOption option(Winding w) {
        String q = w.qDenominator() == 1 ? Integer.toString(w.qNumerator()) : w.qNumerator() + "/" + w.qDenominator();
        return new PoleOption(w.spec().poles(), q, w.q().doubleValue(), w.coilPitchSlots(), w.coilsPerPhase(),
                w.fundamentalWindingFactor(), w.windingFactors().stream().map(HarmonicFactor::windingFactor).toList(),
                w.lcmSlotsPoles(), w.gcdSlotsPoles(), StarOfSlots.allowedParallelPaths(w.spec()));
    }
}
