package coilwright.rewind;

import java.util.Comparator;
import java.util.List;

/**
 * How to order the pole counts a stator can be wound for.
 * <ul>
 *   <li>{@link #WINDING_FACTOR}: highest fundamental winding factor first (most EMF from the copper), then more
 *       cogging cycles per revolution;</li>
 *   <li>{@link #COGGING}: most cogging cycles per revolution, LCM(Q, 2p), first (the cogging torque is usually the
 *       smaller the more cycles there are), then the higher winding factor;</li>
 *   <li>{@link #BALANCED}: the options no other option beats on winding factor, cogging cycles and balanced
 *       magnetic pull at once come first (a Pareto ranking), each rank ordered by winding factor.</li>
 * </ul>
 */
public enum PoleRanking {
    WINDING_FACTOR, COGGING, BALANCED;

    /** Winding factors closer than this count as equal (they come from sums of unit phasors). */
    static final double SAME_FACTOR = 1e-9;

    private static final Comparator<PoleOption> BY_FACTOR = (a, b) -> sameFactor(a, b) ? 0
            : Double.compare(b.fundamentalWindingFactor(), a.fundamentalWindingFactor());
    private static final Comparator<PoleOption> BY_COGGING =
            Comparator.comparingInt(PoleOption::lcmSlotsPoles).reversed();

    /** The options in this order (a new list). */
    public List<PoleOption> sort(List<PoleOption> options) {
        Comparator<PoleOption> order = switch (this) {
            case WINDING_FACTOR -> BY_FACTOR.thenComparing(BY_COGGING);
            case COGGING -> BY_COGGING.thenComparing(BY_FACTOR);
            case BALANCED -> Comparator.comparingInt((PoleOption o) -> paretoRank(o, options))
                    .thenComparing(BY_FACTOR).thenComparing(BY_COGGING);
        };
        return options.stream().sorted(order.thenComparingInt(PoleOption::poles)).toList();
    }

    /** True when the rotor's magnetic pull cancels round the gap: gcd(Q, 2p) of 2 or more. */
    public static boolean pullBalanced(PoleOption o) {
        return o.gcdSlotsPoles() >= 2;
    }

    /** 0 for an option no other one dominates; else 1 + the rank of the best option dominating it. */
    private static int paretoRank(PoleOption o, List<PoleOption> all) {
        int rank = 0;
        List<PoleOption> layer = all;
        while (layer.stream().anyMatch(other -> dominates(other, o))) {
            List<PoleOption> current = layer;
            layer = current.stream().filter(x -> current.stream().anyMatch(y -> dominates(y, x))).toList();
            rank++;
        }
        return rank;
    }

    private static boolean dominates(PoleOption a, PoleOption b) {
        int factor = sameFactor(a, b) ? 0 : Double.compare(a.fundamentalWindingFactor(), b.fundamentalWindingFactor());
        int cogging = Integer.compare(a.lcmSlotsPoles(), b.lcmSlotsPoles());
        int pull = Boolean.compare(pullBalanced(a), pullBalanced(b));
        return factor >= 0 && cogging >= 0 && pull >= 0 && (factor > 0 || cogging > 0 || pull > 0);
    }

    private static boolean sameFactor(PoleOption a, PoleOption b) {
        return Math.abs(a.fundamentalWindingFactor() - b.fundamentalWindingFactor()) <= SAME_FACTOR;
    }
}
