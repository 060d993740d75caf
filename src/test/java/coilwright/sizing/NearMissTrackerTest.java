package coilwright.sizing;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

class NearMissTrackerTest {
    @Test
    void keeps_the_three_smallest_excesses_whatever_the_order_of_arrival() {
        NearMissTracker a = new NearMissTracker();
        a.offer(10, 0.5);
        a.offer(11, 0.1);
        a.offer(12, 0.3);
        a.offer(13, 0.1);
        a.offer(14, 0.9);
        NearMissTracker b = new NearMissTracker();
        b.offer(14, 0.9);
        b.offer(13, 0.1);
        NearMissTracker c = new NearMissTracker();
        c.offer(12, 0.3);
        c.offer(11, 0.1);
        c.offer(10, 0.5);
        b.merge(c);
        assertArrayEquals(new long[] {11, 13, 12}, a.candidates());
        assertArrayEquals(a.candidates(), b.candidates());
    }
}
