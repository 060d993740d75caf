package coilwright.sizing;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.BooleanSupplier;

/**
 * Screens every candidate of a space with the closed forms, in parallel over the winding cases. Each candidate is
 * counted under the first limit it provably breaks; one that breaks exactly one limit is offered to that limit's
 * near-miss tracker; the rest survive with the bounds of their score. Results are merged in case order, so they do
 * not depend on the number of threads.
 */
final class Screening {
    /** Candidates screened between two progress reports and cancellation checks (about a tenth of a second). */
    static final long BLOCK_CANDIDATES = 200_000;

    private final SearchSpace space;
    private final LimitSet limits;
    private final Scoring scoring;
    private final LoadConstants lc;

    Screening(SearchSpace space, LimitSet limits, Scoring scoring, LoadConstants lc) {
        this.space = space;
        this.limits = limits;
        this.scoring = scoring;
        this.lc = lc;
    }

    /** What the screen found. */
    static final class Outcome {
        long screened;
        final long[] pruned;
        final Survivors survivors = new Survivors();
        final NearMissTracker[] nearMisses;

        Outcome(int limitCount) {
            pruned = new long[limitCount];
            nearMisses = new NearMissTracker[limitCount];
            for (int i = 0; i < limitCount; i++) {
                nearMisses[i] = new NearMissTracker();
            }
        }

        void merge(Outcome o) {
            screened += o.screened;
            for (int i = 0; i < pruned.length; i++) {
                pruned[i] += o.pruned[i];
                nearMisses[i].merge(o.nearMisses[i]);
            }
            survivors.addAll(o.survivors);
        }
    }

    Outcome run(ForkJoinPool pool, SizingProgress progress, BooleanSupplier cancelled) {
        int cases = space.cases().size();
        int perBlock = (int) Math.max(1, BLOCK_CANDIDATES / Math.max(1, space.perCase()));
        Outcome total = new Outcome(limits.limits().size());
        progress.update(SizingProgress.Stage.SCREEN, 0, space.size());
        for (int from = 0; from < cases; from += perBlock) {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("sizing cancelled while screening");
            }
            List<Integer> block = new ArrayList<>();
            for (int c = from; c < Math.min(cases, from + perBlock); c++) {
                block.add(c);
            }
            for (Outcome o : Parallel.map(pool, block, this::screenCase)) {
                total.merge(o);
            }
            progress.update(SizingProgress.Stage.SCREEN, total.screened, space.size());
        }
        return total;
    }

    /** Screens one winding case: every wire option, turn count and connection. */
    Outcome screenCase(int caseIndex) {
        List<Limit> list = limits.limits();
        int n = list.size();
        Outcome out = new Outcome(n);
        ScreenValues s = new ScreenValues();
        WindingCase wc = space.cases().get(caseIndex);
        int wires = space.wires().size();
        int connections = space.connections().size();
        for (int w = 0; w < wires; w++) {
            WireOption wire = space.wires().get(w);
            for (int t = 0; t < space.turnCount(); t++) {
                for (int k = 0; k < connections; k++) {
                    long index = space.index(caseIndex, w, t, k);
                    s.compute(index, wc, wire, space.minTurns() + t, space.connections().get(k), lc);
                    screenOne(s, list, out);
                }
            }
        }
        out.screened = space.perCase();
        return out;
    }

    private void screenOne(ScreenValues s, List<Limit> list, Outcome out) {
        int first = -1;
        int broken = 0;
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).screenRejects(s)) {
                broken++;
                if (first < 0) {
                    first = i;
                }
            }
        }
        if (first >= 0) {
            out.pruned[first]++;
            if (broken == 1) {
                Limit l = list.get(first);
                out.nearMisses[first].offer(s.index, l.excess(l.screenBound(s)));
            }
            return;
        }
        scoring.addSurvivor(s, out.survivors);
    }

    /** The counts by limit, in screening order. */
    List<LimitCount> counts(Outcome o) {
        List<LimitCount> out = new ArrayList<>();
        for (int i = 0; i < o.pruned.length; i++) {
            out.add(new LimitCount(limits.limits().get(i).name(), o.pruned[i]));
        }
        return out;
    }
}
