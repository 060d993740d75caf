package coilwright.web.winding;

import coilwright.winding.Coil;
import java.util.ArrayList;
import java.util.List;

/**
 * The height at which each coil's end connection is drawn above the slots, chosen so that no two end connections
 * that overlap round the stator share a height (greedy colouring of the arcs, coils taken in slot order).
 * Positions are counted in half slots so that a double layer's left and right halves are told apart.
 */
final class LoopLevels {
    private LoopLevels() {
    }

    /**
     * @param coils       the coils in slot order
     * @param pitch       coil pitch in slots
     * @param slots       slots round the stator
     * @param twoLayers   true when the return side sits in the right half of its slot
     * @return the level (0 = lowest) of each coil, by index
     */
    static int[] assign(List<Coil> coils, int pitch, int slots, boolean twoLayers) {
        int turn = 2 * slots;
        int length = 2 * pitch + (twoLayers ? 1 : 0);
        int[] level = new int[coils.size()];
        List<int[]> placed = new ArrayList<>();
        for (int i = 0; i < coils.size(); i++) {
            int start = 2 * (coils.get(i).goSlot() - 1);
            int chosen = 0;
            boolean clash = true;
            while (clash) {
                clash = false;
                for (int[] p : placed) {
                    if (p[2] == chosen && overlap(start, start + length, p[0], p[1], turn)) {
                        clash = true;
                        chosen++;
                        break;
                    }
                }
            }
            level[i] = chosen;
            placed.add(new int[] {start, start + length, chosen});
        }
        return level;
    }

    /** Closed arcs [a1, b1] and [a2, b2] on a circle of {@code turn} units share a point. */
    static boolean overlap(int a1, int b1, int a2, int b2, int turn) {
        for (int k = -1; k <= 1; k++) {
            if (a1 <= b2 + k * turn && a2 + k * turn <= b1) {
                return true;
            }
        }
        return false;
    }
}
