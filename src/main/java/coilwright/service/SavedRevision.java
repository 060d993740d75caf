package coilwright.service;

import coilwright.store.StoredRevision;

import java.time.Instant;

/**
 * One immutable saved revision, as the pages and the API show it.
 *
 * @param designId         the design it belongs to
 * @param revisionId       its own permanent id
 * @param number           1 for the first revision of a design, then 2, 3, ... without gaps
 * @param title            as saved (user text: escape when rendering)
 * @param notes            as saved (user text)
 * @param inputJson        the canonical input JSON as saved
 * @param resultJson       the result snapshot the author saw
 * @param toolVersion      the version of the tool that computed {@code resultJson}
 * @param schemaVersion    the version of the input schema of {@code inputJson}
 * @param createdAt        when the revision was saved (UTC, microsecond precision)
 * @param latestRevisionId the design's latest revision now; differs from {@code revisionId} when a newer one exists
 */
public record SavedRevision(String designId, String revisionId, int number, String title, String notes,
                            String inputJson, String resultJson, String toolVersion, int schemaVersion,
                            Instant createdAt, String latestRevisionId) {

    /** True when the design has a revision newer than this one. */
    public boolean isSuperseded() {
        return !revisionId.equals(latestRevisionId);
    }

    static SavedRevision of(StoredRevision r) {
        return new SavedRevision(r.designId(), r.revisionId(), r.number(), r.title(), r.notes(), r.inputJson(),
                r.resultJson(), r.toolVersion(), r.schemaVersion(), r.createdAt(), r.latestRevisionId());
    }
}
