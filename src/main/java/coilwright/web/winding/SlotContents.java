package coilwright.web.winding;

import coilwright.winding.Coil;
import coilwright.winding.Layers;
import coilwright.winding.Winding;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What each slot of a laid-out winding holds, as the drawings show it: the coil sides by position (in a double
 * layer the coil's start side on the left half, the return side on the right half), each with its phase and the
 * way the phase current runs along it.
 */
final class SlotContents {
    /**
     * One coil side in a slot.
     *
     * @param position 0 for the left half (or the whole slot of a single layer), 1 for the right half
     * @param up       true when a positive phase current runs along this side away from the connection end
     */
    record Side(int slot, int position, Coil coil, boolean up) {
    }

    private final int slots;
    private final List<List<Side>> bySlot;

    private SlotContents(int slots, List<List<Side>> bySlot) {
        this.slots = slots;
        this.bySlot = bySlot;
    }

    static SlotContents of(Winding w) {
        int q = w.spec().slots();
        boolean two = w.spec().layers() == Layers.DOUBLE;
        List<List<Side>> bySlot = new ArrayList<>();
        for (int s = 0; s < q; s++) {
            bySlot.add(new ArrayList<>());
        }
        for (Coil c : w.coils()) {
            // a forward coil carries the phase current out along its start side and back along its return side
            bySlot.get(c.goSlot() - 1).add(new Side(c.goSlot(), 0, c, c.polarity() > 0));
            bySlot.get(c.returnSlot() - 1).add(new Side(c.returnSlot(), two ? 1 : 0, c, c.polarity() < 0));
        }
        bySlot.forEach(list -> list.sort(Comparator.comparingInt(Side::position)));
        return new SlotContents(q, bySlot.stream().map(List::copyOf).toList());
    }

    /** The sides in 1-based slot {@code slot}, left first. */
    List<Side> in(int slot) {
        return bySlot.get(slot - 1);
    }

    /**
     * The length in slots of the shortest stretch whose pattern of sides (position, phase, direction) repeats all
     * round the stator. For a double layer this is Q/t with t = gcd(Q, p), because the slot phasors repeat every
     * Q/t slots (Bianchi and Dai Pre, 2006); it is worked out here from the drawn sides themselves.
     */
    int repeatSlots() {
        for (int d = 1; d < slots; d++) {
            if (slots % d == 0 && repeatsEvery(d)) {
                return d;
            }
        }
        return slots;
    }

    private boolean repeatsEvery(int d) {
        for (int s = 1; s <= slots; s++) {
            if (!signature(s).equals(signature((s - 1 + d) % slots + 1))) {
                return false;
            }
        }
        return true;
    }

    private List<String> signature(int slot) {
        return in(slot).stream().map(x -> x.position() + x.coil().phaseName() + (x.up() ? "u" : "d")).toList();
    }
}
