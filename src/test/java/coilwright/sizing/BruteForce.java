package coilwright.sizing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.LongStream;

/**
 * Every candidate of a (small) space under the closed forms and under the full model, for comparison with the
 * search. Slow by design: it refines everything.
 */
final class BruteForce {
    final SizingRequest request;
    final SizingSearch.Prepared prepared;
    final Refiner refiner;
    final long size;

    BruteForce(SizingRequest request, ForkJoinPool pool) {
        this.request = request;
        this.prepared = new SizingSearch(pool).prepare(request, SizingProgress.NONE);
        this.refiner = new Refiner(prepared.space(), prepared.drive(), prepared.limits(), prepared.scoring(), pool,
                SizingProgress.NONE, () -> false);
        this.size = prepared.space().size();
        refiner.evaluate(LongStream.range(0, size).boxed().toList());
    }

    FullEvaluation full(long candidate) {
        return refiner.cached(candidate);
    }

    boolean feasible(long candidate) {
        return refiner.feasible(full(candidate));
    }

    /** The limits the screen proves broken for a candidate, by position in the limit list. */
    List<Integer> screenRejections(long candidate) {
        SearchSpace s = prepared.space();
        ScreenValues v = new ScreenValues();
        v.compute(candidate, s.caseOf(candidate), s.wireOf(candidate), s.turnsOf(candidate), s.connectionOf(candidate),
                prepared.lc());
        List<Integer> out = new ArrayList<>();
        List<Limit> limits = prepared.limits().limits();
        for (int i = 0; i < limits.size(); i++) {
            if (limits.get(i).screenRejects(v)) {
                out.add(i);
            }
        }
        return out;
    }

    /** The closed-form values of a candidate. */
    ScreenValues screen(long candidate) {
        SearchSpace s = prepared.space();
        ScreenValues v = new ScreenValues();
        v.compute(candidate, s.caseOf(candidate), s.wireOf(candidate), s.turnsOf(candidate), s.connectionOf(candidate),
                prepared.lc());
        return v;
    }

    /** The k best feasible candidates by the full model's score, ties to the lower number. */
    List<Long> best(int k) {
        Scoring sc = prepared.scoring();
        return LongStream.range(0, size).filter(this::feasible).boxed()
                .sorted(Comparator.comparingDouble((Long c) -> -sc.score(full(c))).thenComparing(c -> c))
                .limit(k).toList();
    }

    /** The Pareto front of the feasible candidates (value up, cost down), cheapest first. */
    List<Long> front() {
        Scoring sc = prepared.scoring();
        List<Long> feasible = LongStream.range(0, size).filter(this::feasible).boxed().toList();
        List<Long> out = new ArrayList<>();
        for (long c : feasible) {
            double v = sc.frontValue(full(c));
            double cost = sc.frontCost(full(c));
            boolean dominated = feasible.stream().anyMatch(o -> o != c
                    && sc.frontCost(full(o)) <= cost && sc.frontValue(full(o)) >= v
                    && (sc.frontCost(full(o)) < cost || sc.frontValue(full(o)) > v || o < c));
            if (!dominated) {
                out.add(c);
            }
        }
        out.sort(Comparator.comparingDouble((Long c) -> sc.frontCost(full(c))).thenComparing(c -> c));
        return out;
    }
}
