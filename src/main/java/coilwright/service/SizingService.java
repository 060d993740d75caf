package coilwright.service;

import coilwright.sizing.SizingProgress;
import coilwright.sizing.SizingRequest;
import coilwright.sizing.SizingResult;
import coilwright.sizing.SizingSearch;

import java.util.concurrent.ForkJoinPool;
import java.util.function.BooleanSupplier;

/**
 * Design from requirements: runs a {@link SizingRequest} on a pool of threads. A small search can be answered
 * inline; a large one belongs in a job that reports progress and can be cancelled.
 */
public final class SizingService {
    private final SizingSearch search;

    /** Uses a pool with one thread per available processor. */
    public SizingService() {
        this(new ForkJoinPool(Runtime.getRuntime().availableProcessors()));
    }

    /** @param pool the threads the searches run on */
    public SizingService(ForkJoinPool pool) {
        this(pool, SizingSearch.MAX_CANDIDATES);
    }

    /**
     * @param pool          the threads the searches run on
     * @param maxCandidates the most candidates one search takes (a larger space is refused with its size, this cap
     *                      and how to narrow it), 1 to {@link SizingSearch#MAX_CANDIDATES}
     */
    public SizingService(ForkJoinPool pool, long maxCandidates) {
        this.search = new SizingSearch(pool, maxCandidates);
    }

    /**
     * The number of candidates a request makes (its layouts are built, nothing is screened): to decide between an
     * answer inline and a job.
     *
     * @throws coilwright.validation.InvalidInputException when the space is too large or a value is out of range
     */
    public long candidateCount(SizingRequest request) {
        return search.candidateCount(request);
    }

    /**
     * Runs a search to its end.
     *
     * @throws coilwright.validation.InvalidInputException     when the space is too large (the message says how to
     *                                                         narrow it) or a value is out of range
     * @throws coilwright.validation.InfeasibleDesignException when the drive itself cannot work (penstock, runner)
     */
    public SizingResult size(SizingRequest request) {
        return search.run(request);
    }

    /**
     * Runs a search, reporting progress and stopping when asked.
     *
     * @param progress  called from the searching thread after each block of work
     * @param cancelled polled between blocks; true stops the search
     * @throws java.util.concurrent.CancellationException when cancelled
     */
    public SizingResult size(SizingRequest request, SizingProgress progress, BooleanSupplier cancelled) {
        return search.run(request, progress, cancelled);
    }
}
