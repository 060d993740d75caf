package coilwright.store;

import java.time.Instant;

/** One line of a design's history: revision number, its id, when it was saved and its title. */
public record RevisionSummary(int number, String revisionId, Instant createdAt, String title) {
}
