package coilwright.sizing;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class PositionHeapTest {
    @Test
    void pops_positions_in_the_given_order_ties_by_position() {
        double[] keys = new double[500];
        Random r = new Random(7);
        for (int i = 0; i < keys.length; i++) {
            keys[i] = r.nextInt(50);
        }
        PositionHeap heap = new PositionHeap(keys.length, (a, b) -> {
            int c = Double.compare(keys[b], keys[a]);
            return c != 0 ? c : Integer.compare(a, b);
        });
        List<Integer> out = new ArrayList<>();
        while (!heap.isEmpty()) {
            out.add(heap.pop());
        }
        assertEquals(keys.length, out.size());
        for (int i = 1; i < out.size(); i++) {
            int a = out.get(i - 1);
            int b = out.get(i);
            assertTrue(keys[a] > keys[b] || keys[a] == keys[b] && a < b, "order at " + i);
        }
    }
}
