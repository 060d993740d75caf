package coilwright.sizing;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.validation.SolverFailedException;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.BooleanSupplier;

/**
 * Refines screened candidates with the full model, most promising first. A candidate whose bound cannot beat the
 * k-th best design found so far (score, then candidate number) is never refined, and the ranking ends only when no
 * candidate left can, so the designs returned are exactly the k best under the full model among all candidates
 * meeting every limit (or, stopped by the budget, the best found, with the bound of what is left). Candidates are refined in batches of
 * a fixed size on the pool; the batches depend only on the request, so the counts and the ranking do not depend on
 * the number of threads.
 */
final class Refiner {
    /** Candidates refined together; fixed so the work done does not depend on the thread count. */
    static final int BATCH = 8;

    private final SearchSpace space;
    private final DriveModel drive;
    private final LimitSet limits;
    private final Scoring scoring;
    private final ForkJoinPool pool;
    private final SizingProgress progress;
    private final BooleanSupplier cancelled;
    private final Map<Long, FullEvaluation> cache = new HashMap<>();
    private final long[] rejectedBy;
    private final NearMissTracker[] nearMisses;
    private int evaluated;

    Refiner(SearchSpace space, DriveModel drive, LimitSet limits, Scoring scoring, ForkJoinPool pool,
            SizingProgress progress, BooleanSupplier cancelled) {
        this.space = space;
        this.drive = drive;
        this.limits = limits;
        this.scoring = scoring;
        this.pool = pool;
        this.progress = progress;
        this.cancelled = cancelled;
        this.rejectedBy = new long[limits.limits().size() + 1];
        this.nearMisses = new NearMissTracker[limits.limits().size()];
        for (int i = 0; i < nearMisses.length; i++) {
            nearMisses[i] = new NearMissTracker();
        }
    }

    /**
     * The k best feasible candidates, best first, whether the search ran to its end, and if not the highest score
     * bound among the candidates left.
     */
    record Best(List<Long> candidates, boolean proven, double unexploredScoreBound) {
    }

    /**
     * Refines in the order of the score estimates, best first, skipping any candidate whose bound cannot enter the
     * k best found so far, and stops when the highest bound still open cannot either (proven) or at the budget.
     *
     * @param budget most full evaluations in all, counting those already made
     */
    Best best(Survivors s, int k, int budget) {
        PositionHeap byEstimate = new PositionHeap(s.size(), (a, b) -> {
            int c = Double.compare(s.scoreEstimate(b), s.scoreEstimate(a));
            return c != 0 ? c : Long.compare(s.index(a), s.index(b));
        });
        PositionHeap byBound = new PositionHeap(s.size(), (a, b) -> {
            int c = Double.compare(s.scoreBound(b), s.scoreBound(a));
            return c != 0 ? c : Long.compare(s.index(a), s.index(b));
        });
        boolean[] done = new boolean[s.size()];
        List<Long> found = new ArrayList<>();     // best first
        List<Double> scores = new ArrayList<>();
        while (true) {
            while (!byBound.isEmpty() && done[byBound.peek()]) {
                byBound.pop();
            }
            if (byBound.isEmpty() || found.size() == k && !beats(s.scoreBound(byBound.peek()),
                    s.index(byBound.peek()), scores.get(k - 1), found.get(k - 1))) {
                return new Best(List.copyOf(found), true, Double.NaN);
            }
            List<Long> batch = new ArrayList<>();
            while (!byEstimate.isEmpty() && batch.size() < BATCH && evaluated + batch.size() < budget) {
                int p = byEstimate.pop();
                done[p] = true;
                if (found.size() < k || beats(s.scoreBound(p), s.index(p), scores.get(k - 1), found.get(k - 1))) {
                    batch.add(s.index(p));
                }
            }
            if (batch.isEmpty() && evaluated >= budget) {
                return new Best(List.copyOf(found), false, s.scoreBound(byBound.peek()));
            }
            evaluate(batch);
            for (long c : batch) {
                FullEvaluation f = cache.get(c);
                if (feasible(f)) {
                    insert(found, scores, c, scoring.score(f), k);
                }
            }
            progress.update(SizingProgress.Stage.REFINE, evaluated, budget);
        }
    }

    private static boolean beats(double bound, long candidate, double score, long holder) {
        return bound > score || bound == score && candidate < holder;
    }

    private static void insert(List<Long> found, List<Double> scores, long c, double score, int k) {
        int pos = found.size();
        while (pos > 0 && beats(score, c, scores.get(pos - 1), found.get(pos - 1))) {
            pos--;
        }
        if (pos < k) {
            found.add(pos, c);
            scores.add(pos, score);
            if (found.size() > k) {
                found.remove(k);
                scores.remove(k);
            }
        }
    }

    /** The Pareto front, cheapest first, and whether it is complete. */
    record Front(List<Long> candidates, boolean complete) {
    }

    /** @param budget most full evaluations in all, counting those already made */
    Front front(Survivors s, int budget) {
        PositionHeap order = new PositionHeap(s.size(), (a, b) -> {
            int c = Double.compare(s.cost(a), s.cost(b));
            c = c != 0 ? c : Double.compare(s.valueBound(b), s.valueBound(a));
            return c != 0 ? c : Long.compare(s.index(a), s.index(b));
        });
        List<Long> front = new ArrayList<>();
        List<Double> costs = new ArrayList<>();
        double best = Double.NEGATIVE_INFINITY;
        while (!order.isEmpty()) {
            List<Long> batch = new ArrayList<>();
            int fresh = 0;
            while (!order.isEmpty() && batch.size() < BATCH) {
                int p = order.peek();
                if (s.valueBound(p) <= best) {
                    order.pop();
                    continue;
                }
                boolean cached = cache.containsKey(s.index(p));
                if (!cached && evaluated + fresh >= budget) {
                    break;
                }
                fresh += cached ? 0 : 1;
                batch.add(s.index(order.pop()));
            }
            if (batch.isEmpty()) {
                return order.isEmpty() ? new Front(undominated(front, costs), true) : new Front(evaluatedFront(), false);
            }
            evaluate(batch);
            for (long c : batch) {
                FullEvaluation f = cache.get(c);
                if (feasible(f) && scoring.frontValue(f) > best) {
                    best = scoring.frontValue(f);
                    front.add(c);
                    costs.add(scoring.frontCost(f));
                }
            }
            progress.update(SizingProgress.Stage.PARETO, evaluated, budget);
        }
        return new Front(undominated(front, costs), true);
    }

    /**
     * When the budget ends the sweep early: the designs no other evaluated design beats on both axes, so the user
     * still sees the trade-off among everything the full model has seen.
     */
    private List<Long> evaluatedFront() {
        List<Long> feasible = cache.keySet().stream().filter(c -> feasible(cache.get(c))).sorted((a, b) -> {
            FullEvaluation fa = cache.get(a);
            FullEvaluation fb = cache.get(b);
            int c = Double.compare(scoring.frontCost(fa), scoring.frontCost(fb));
            c = c != 0 ? c : Double.compare(scoring.frontValue(fb), scoring.frontValue(fa));
            return c != 0 ? c : Long.compare(a, b);
        }).toList();
        List<Long> front = new ArrayList<>();
        List<Double> costs = new ArrayList<>();
        double best = Double.NEGATIVE_INFINITY;
        for (long c : feasible) {
            FullEvaluation f = cache.get(c);
            if (scoring.frontValue(f) > best) {
                best = scoring.frontValue(f);
                front.add(c);
                costs.add(scoring.frontCost(f));
            }
        }
        return undominated(front, costs);
    }

    /** Drops a front point whose successor costs the same and gives more. */
    private static List<Long> undominated(List<Long> front, List<Double> costs) {
        List<Long> out = new ArrayList<>();
        for (int i = 0; i < front.size(); i++) {
            if (i + 1 == front.size() || costs.get(i + 1) > costs.get(i)) {
                out.add(front.get(i));
            }
        }
        return out;
    }

    /** Full evaluations of candidates not yet evaluated, on the pool, in the batch's order. */
    void evaluate(List<Long> batch) {
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("sizing cancelled while refining");
        }
        List<Long> missing = batch.stream().filter(c -> !cache.containsKey(c)).toList();
        List<FullEvaluation> done = Parallel.map(pool, missing, this::fullEvaluation);
        for (int i = 0; i < missing.size(); i++) {
            FullEvaluation f = done.get(i);
            cache.put(missing.get(i), f);
            record(missing.get(i), f);
        }
        evaluated += missing.size();
    }

    private void record(long candidate, FullEvaluation f) {
        if (!f.built()) {
            rejectedBy[rejectedBy.length - 1]++;
            return;
        }
        int first = limits.firstBroken(f);
        if (first >= 0) {
            rejectedBy[first]++;
            if (limits.brokenCount(f) == 1) {
                Limit l = limits.limits().get(first);
                nearMisses[first].offer(candidate, l.excess(l.figure(f)));
            }
        }
    }

    /** The full model of one candidate: the machine built, then the drive's evaluation. */
    FullEvaluation fullEvaluation(long candidate) {
        AlternatorSpec spec = space.spec(candidate);
        try {
            Alternator alt = AlternatorModel.build(spec);
            FullEvaluation f = drive.evaluate(alt);
            return limits.needsMachineFigures() ? MachineFigures.add(f, alt, space.request().load()) : f;
        } catch (InfeasibleDesignException | InvalidInputException | SolverFailedException e) {
            return FullEvaluation.refused(spec, e.getMessage());
        }
    }

    boolean feasible(FullEvaluation f) {
        return f.built() && limits.firstBroken(f) < 0;
    }

    FullEvaluation cached(long candidate) {
        return cache.get(candidate);
    }

    /**
     * Makes sure the designs to report carry the machine's figures (winding hot spot, cogging), working out on the
     * pool those a limit did not already need.
     */
    void reported(List<Long> candidates) {
        List<Long> missing = candidates.stream().distinct()
                .filter(c -> cache.get(c).built() && Double.isNaN(cache.get(c).ratedWindingHotSpotC())).toList();
        List<FullEvaluation> done = Parallel.map(pool, missing, c -> {
            FullEvaluation f = cache.get(c);
            try {
                return MachineFigures.add(f, AlternatorModel.build(f.spec()), space.request().load());
            } catch (InfeasibleDesignException | InvalidInputException | SolverFailedException e) {
                return f;
            }
        });
        for (int i = 0; i < missing.size(); i++) {
            cache.put(missing.get(i), done.get(i));
        }
    }

    int evaluated() {
        return evaluated;
    }

    long[] rejectedBy() {
        return rejectedBy.clone();
    }

    NearMissTracker nearMisses(int limit) {
        return nearMisses[limit];
    }
}
