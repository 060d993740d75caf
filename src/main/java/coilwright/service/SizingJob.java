package coilwright.service;

import coilwright.sizing.SizingResult;

import java.util.Optional;

/**
 * A design search run as a job, as seen at one moment.
 *
 * @param id          the job's id: 128 random bits in hex, known only to whoever started it
 * @param status      RUNNING, DONE, FAILED or CANCELLED
 * @param stage       the search's stage while running (LAYOUTS, SCREEN, REFINE, PARETO, NEAR_MISSES)
 * @param done        units done in that stage
 * @param total       units in that stage, as far as known
 * @param fraction    an estimate of the whole search done, 0 to 1 (1 once finished)
 * @param candidates  candidates in the request's space
 * @param elapsedMs   time the search has run, or ran, ms
 * @param result      the answer, once DONE
 * @param message     why the job FAILED or was CANCELLED
 * @param expiresInS  seconds until a finished job is forgotten; empty while running
 */
public record SizingJob(String id, Status status, Optional<String> stage, long done, long total, double fraction,
                        long candidates, long elapsedMs, Optional<SizingResult> result, Optional<String> message,
                        Optional<Long> expiresInS) {
    /** Where a job is. */
    public enum Status { RUNNING, DONE, FAILED, CANCELLED }

    /** The same view without the result (progress events stay small; the result is read with the job). */
    public SizingJob withoutResult() {
        return new SizingJob(id, status, stage, done, total, fraction, candidates, elapsedMs, Optional.empty(), message,
                expiresInS);
    }

    /** True once the job will change no more. */
    public boolean finished() {
        return status != Status.RUNNING;
    }
}
