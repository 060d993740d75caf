package coilwright.service;

import coilwright.sizing.SizingResult;

import java.util.Optional;

/**
 * How a design search was answered: inline with its result (a small space), or as a job started for it.
 *
 * @param result the result when answered inline
 * @param job    the job when one was started
 */
public record SizingAnswer(Optional<SizingResult> result, Optional<SizingJob> job) {
    public SizingAnswer {
        if (result.isPresent() == job.isPresent()) {
            throw new IllegalArgumentException("an answer is either a result or a job");
        }
    }
}
