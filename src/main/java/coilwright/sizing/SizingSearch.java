package coilwright.sizing;

import coilwright.validation.InvalidInputException;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.ForkJoinPool;
import java.util.function.BooleanSupplier;

/**
 * Design from requirements: enumerates the layouts, screens every candidate with the closed forms, refines the
 * survivors best first with the full model, and assembles the ranking, the Pareto front of energy (or output)
 * against cost, and, when nothing meets every limit, the nearest misses.
 *
 * <p>The closed forms are the full model's own where they can be (EMF constant, resistance, fill, masses, cut-in
 * threshold, open-circuit voltage) and proven bounds elsewhere ({@link BridgeBounds}, the drives' bounds), so the
 * screen discards only what the full model would reject and the ranking is the full model's. Work is spread over
 * the pool and merged in a fixed order: the answer does not depend on the number of threads.
 */
public final class SizingSearch {
    /** The most candidates a search takes unless a lower cap is given. */
    public static final long MAX_CANDIDATES = SearchSpace.MAX_CANDIDATES;

    private final ForkJoinPool pool;
    private final long maxCandidates;

    /** @param pool the threads to use (all cores: {@link ForkJoinPool#commonPool()}) */
    public SizingSearch(ForkJoinPool pool) {
        this(pool, MAX_CANDIDATES);
    }

    /**
     * @param pool          the threads to use
     * @param maxCandidates the most candidates one search takes, 1 to {@link #MAX_CANDIDATES}: a larger space is
     *                      refused (400) with its size and how to narrow it
     */
    public SizingSearch(ForkJoinPool pool, long maxCandidates) {
        if (maxCandidates < 1 || maxCandidates > MAX_CANDIDATES) {
            throw new IllegalArgumentException("maxCandidates = " + maxCandidates + ": must be 1 to " + MAX_CANDIDATES);
        }
        this.pool = pool;
        this.maxCandidates = maxCandidates;
    }

    /**
     * Runs a search to its end.
     *
     * @throws InvalidInputException when the space is larger than the search takes (the message says how to narrow
     *                               it) or a part of the request is out of range
     * @throws coilwright.validation.InfeasibleDesignException when the drive itself cannot work (penstock, runner)
     */
    public SizingResult run(SizingRequest request) {
        return run(request, SizingProgress.NONE, () -> false);
    }

    /**
     * Runs a search, reporting progress and stopping when asked.
     *
     * @param progress  told of each stage's progress, from the calling thread
     * @param cancelled polled between blocks of work; when it answers true the search stops
     * @throws java.util.concurrent.CancellationException when cancelled
     */
    public SizingResult run(SizingRequest request, SizingProgress progress, BooleanSupplier cancelled) {
        Prepared p = prepare(request, progress);
        Screening.Outcome screen = p.screening().run(pool, progress, cancelled);
        Refiner refiner = new Refiner(p.space(), p.drive(), p.limits(), p.scoring(), pool, progress, cancelled);
        Refiner.Best best = refiner.best(screen.survivors, request.resultCount(), request.maxFullEvaluations());
        // the front has a budget of its own, and reuses every evaluation made for the ranking
        Refiner.Front front = refiner.front(screen.survivors, refiner.evaluated() + request.maxFullEvaluations());
        refiner.reported(best.candidates());
        List<SizedDesign> designs = new ArrayList<>();
        for (int i = 0; i < best.candidates().size(); i++) {
            designs.add(design(p, refiner, best.candidates().get(i), i + 1));
        }
        List<NearMiss> near = List.of();
        if (designs.isEmpty()) {
            progress.update(SizingProgress.Stage.NEAR_MISSES, 0, p.limits().limits().size());
            near = NearMisses.find(refiner, screen, p.limits(), c -> design(p, refiner, c, 0));
        }
        List<SizedDesign> frontDesigns = front.candidates().stream().map(c -> design(p, refiner, c, 0)).toList();
        List<String> notes = new ArrayList<>(p.limits().notes());
        notes.add("Iron, eddy-current and friction losses are not modelled yet: efficiencies are of the copper, "
                + "cables and rectifier only");
        if (p.space().size() == 0) {
            notes.add("No layout could be built from these poles, sizes and magnets (see counts.layoutsRejected for "
                    + "why each was set aside): widen the pole range, or choose magnets that suit the size");
        } else if (designs.isEmpty() && near.isEmpty()) {
            notes.add("No design meets every limit, and none misses by one limit alone: each candidate breaks two or "
                    + "more (see counts.prunedByLimit and counts.rejectedByFullModel); relax the limits that removed "
                    + "most, or widen what can be built");
        }
        if (!best.proven()) {
            notes.add(String.format(Locale.ROOT, "The search stopped at maxFullEvaluations = %d with candidates "
                    + "left whose bound could still beat the designs returned; raise it for a proven ranking",
                    request.maxFullEvaluations()));
        }
        SizingCounts counts = new SizingCounts(p.layouts().drafted(), rejections(p.layouts()),
                p.layouts().layouts().size(), p.space().size(), screen.screened, p.screening().counts(screen),
                screen.survivors.size(), refiner.evaluated(), fullRejections(p.limits(), refiner), designs.size());
        OptionalDouble unexplored = best.proven() ? OptionalDouble.empty()
                : OptionalDouble.of(request.objective().maximise() ? best.unexploredScoreBound()
                : -best.unexploredScoreBound());
        return new SizingResult(request.objective(), designs, best.proven(), unexplored, frontDesigns, front.complete(),
                p.scoring().frontValueName(), p.scoring().frontCostName(), near, p.limits().applied(), counts, notes);
    }

    /**
     * The number of candidates a request makes, without screening them (the layouts are drafted and built): for
     * choosing between an answer inline and a job.
     *
     * @throws InvalidInputException as {@link #run(SizingRequest)} when the space is too large
     */
    public long candidateCount(SizingRequest request) {
        return prepare(request, SizingProgress.NONE).space().size();
    }

    /** Everything a search needs before it screens: layouts, space, load constants, drive, limits, scoring. */
    record Prepared(Layouts layouts, SearchSpace space, LoadConstants lc, DriveModel drive, LimitSet limits,
                    Scoring scoring, Screening screening) {
    }

    Prepared prepare(SizingRequest request, SizingProgress progress) {
        progress.update(SizingProgress.Stage.LAYOUTS, 0, 1);
        Layouts layouts = Layouts.of(request, pool);
        SearchSpace space = new SearchSpace(request, layouts.layouts(), maxCandidates);
        LoadConstants lc = LoadConstants.of(request.load(), request.winding().windingTempC());
        DriveModel drive = DriveModel.of(request, lc);
        LimitSet limits = LimitSet.of(request, drive, lc, layouts.layouts());
        Scoring scoring = new Scoring(request.objective(), drive, lc, request.prices());
        progress.update(SizingProgress.Stage.LAYOUTS, 1, 1);
        return new Prepared(layouts, space, lc, drive, limits, scoring, new Screening(space, limits, scoring, lc));
    }

    private static SizedDesign design(Prepared p, Refiner refiner, long candidate, int rank) {
        FullEvaluation f = refiner.cached(candidate);
        SearchSpace s = p.space();
        String winding = String.format(Locale.ROOT, "%s; %d turns of %s, %s, %d path%s", s.caseOf(candidate).layout()
                        .label(), s.turnsOf(candidate), s.wireOf(candidate).wire().label(),
                s.connectionOf(candidate).name().toLowerCase(Locale.ROOT), s.caseOf(candidate).paths(),
                s.caseOf(candidate).paths() == 1 ? "" : "s");
        return new SizedDesign(rank, candidate, winding, f.spec(),
                DesignFigures.of(f, p.space().request(), p.drive().hasEnergy()), f.cautions());
    }

    private static List<LimitCount> rejections(Layouts layouts) {
        List<LimitCount> out = new ArrayList<>();
        for (Map.Entry<LayoutRejection, Long> e : layouts.rejected().entrySet()) {
            out.add(new LimitCount(e.getKey().name().toLowerCase(Locale.ROOT), e.getValue()));
        }
        return out;
    }

    private static List<LimitCount> fullRejections(LimitSet limits, Refiner refiner) {
        long[] r = refiner.rejectedBy();
        List<LimitCount> out = new ArrayList<>();
        for (int i = 0; i < limits.limits().size(); i++) {
            out.add(new LimitCount(limits.limits().get(i).name(), r[i]));
        }
        out.add(new LimitCount("model", r[r.length - 1]));
        return out;
    }
}
