package coilwright.sizing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.LongFunction;
import java.util.stream.Collectors;

/**
 * When nothing meets every limit: for each limit, the candidate that breaks only that limit by the least under the
 * full model. The candidates tried are the few the screen found breaking only that limit and the few the full
 * model found so; the screen's own are refined here (a handful per limit, beyond the evaluation budget).
 */
final class NearMisses {
    private NearMisses() {
    }

    static List<NearMiss> find(Refiner refiner, Screening.Outcome screen, LimitSet limits,
                               LongFunction<SizedDesign> design) {
        List<Limit> list = limits.limits();
        record Miss(int limit, long candidate, double excess) {
        }
        List<Miss> misses = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            Set<Long> tried = new LinkedHashSet<>();
            for (long c : screen.nearMisses[i].candidates()) {
                tried.add(c);
            }
            for (long c : refiner.nearMisses(i).candidates()) {
                tried.add(c);
            }
            refiner.evaluate(List.copyOf(tried));
            Limit l = list.get(i);
            Miss best = null;
            for (long c : tried) {
                FullEvaluation f = refiner.cached(c);
                if (!f.built() || limits.brokenCount(f) != 1 || !l.rejects(f)) {
                    continue;
                }
                double e = l.excess(l.figure(f));
                if (best == null || e < best.excess() || e == best.excess() && c < best.candidate()) {
                    best = new Miss(i, c, e);
                }
            }
            if (best != null) {
                misses.add(best);
            }
        }
        misses.sort(Comparator.comparingDouble(Miss::excess).thenComparingLong(Miss::candidate));
        List<NearMiss> out = new ArrayList<>();
        for (Miss m : misses) {
            Limit l = list.get(m.limit());
            FullEvaluation f = refiner.cached(m.candidate());
            double needed = l.figure(f);
            String others = list.stream().filter(x -> x != l).map(Limit::phrase).collect(Collectors.joining(", "));
            String message = "nothing that " + l.phrase() + (others.isEmpty() ? "" : " also " + others)
                    + "; the closest needs " + l.format(needed);
            out.add(new NearMiss(l.name(), l.field(), l.allowed(), needed, l.unit(), message,
                    design.apply(m.candidate())));
        }
        return out;
    }
}
