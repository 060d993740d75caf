package coilwright.service;

import coilwright.store.RevisionSummary;

import java.time.Instant;

/** One line of a design's history: revision number, its id, when it was saved and its title. */
public record HistoryEntry(int number, String revisionId, Instant createdAt, String title) {
    static HistoryEntry of(RevisionSummary s) {
        return new HistoryEntry(s.number(), s.revisionId(), s.createdAt(), s.title());
    }
}
