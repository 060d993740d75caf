package coilwright.winding;

import org.apache.commons.math3.util.ArithmeticUtils;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Splits a phase's coils into parallel paths of identical make-up. Coils with the same go-slot angle and
 * polarity have the same EMF at every odd harmonic, so a path count a is allowed when every such class of
 * coils, in every phase, divides by a (common practice for symmetrical parallel circuits).
 */
final class ParallelPaths {
    private ParallelPaths() {
    }

    /** Class key: the coil's effective go-side angle in units of pi/Q, a reversed coil turned by 180 degrees. */
    private static int key(Coil c, SlotStar star, int slots) {
        int n = star.angleUnits(c.goSlot() - 1, 1) + (c.polarity() < 0 ? slots : 0);
        return Math.floorMod(n, 2 * slots);
    }

    private static Map<Integer, List<Integer>> classes(List<Coil> coils, List<Integer> numbers, SlotStar star) {
        Map<Integer, List<Integer>> byKey = new LinkedHashMap<>();
        for (int n : numbers) {
            byKey.computeIfAbsent(key(coils.get(n - 1), star, star.slots()), k -> new ArrayList<>()).add(n);
        }
        return byKey;
    }

    static List<Integer> allowed(List<Coil> coils, List<List<Integer>> phaseCoils, SlotStar star) {
        int g = 0;
        for (List<Integer> phase : phaseCoils) {
            for (List<Integer> cls : classes(coils, phase, star).values()) {
                g = ArithmeticUtils.gcd(g, cls.size());
            }
        }
        List<Integer> out = new ArrayList<>();
        for (int a = 1; a <= g; a++) {
            if (g % a == 0) {
                out.add(a);
            }
        }
        return List.copyOf(out);
    }

    /** The phase's coils in {@code paths} groups: each group takes an equal consecutive share of every class. */
    static List<List<Integer>> split(List<Coil> coils, List<Integer> phase, int paths, SlotStar star) {
        List<List<Integer>> groups = new ArrayList<>();
        for (int i = 0; i < paths; i++) {
            groups.add(new ArrayList<>());
        }
        for (List<Integer> cls : classes(coils, phase, star).values()) {
            int share = cls.size() / paths;
            for (int i = 0; i < cls.size(); i++) {
                groups.get(i / share).add(cls.get(i));
            }
        }
        groups.forEach(list -> list.sort(Integer::compare));
        return groups.stream().map(List::copyOf).toList();
    }
}
