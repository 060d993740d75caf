package coilwright.web.saved;

import coilwright.service.Recomputation;
import coilwright.service.TreeDiff;
import coilwright.service.HistoryEntry;
import coilwright.service.SaveReceipt;
import coilwright.service.SavedRevision;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.List;
import java.util.Optional;

/** The JSON shapes of the saved-design API (documented in {@code openapi/saved.json}). */
final class SavedJson {
    private SavedJson() {
    }

    /** Where a revision can be seen and downloaded. */
    record Links(String design, String revision, String export, String curves, String recomputed, String print) {
        static Links of(String designId, String revisionId) {
            String page = "/d/" + designId + "/r/" + revisionId;
            String api = "/api/v1/revisions/" + revisionId;
            return new Links("/d/" + designId, page, api + "/export", api + "/curves.csv", api + "/recomputed", page + "/print");
        }
    }

    /** The answer to a save: the edit token appears only when this call created the design. */
    record Saved(String designId, String revisionId, boolean created,
                 @JsonInclude(JsonInclude.Include.NON_ABSENT) Optional<String> editToken, Links links) {
        static Saved of(SaveReceipt o) {
            return new Saved(o.designId(), o.revisionId(), o.created(), o.editToken(), Links.of(o.designId(), o.revisionId()));
        }
    }

    record Revision(String designId, String revisionId, int number, String title, String notes, String createdAt,
                    String toolVersion, int schemaVersion, String latestRevisionId, boolean newerRevisionExists,
                    JsonNode design, JsonNode results, Links links) {
        static Revision of(SavedRevision r, JsonNode design, JsonNode results) {
            return new Revision(r.designId(), r.revisionId(), r.number(), r.title(), r.notes(), r.createdAt().toString(),
                    r.toolVersion(), r.schemaVersion(), r.latestRevisionId(), r.isSuperseded(), design, results,
                    Links.of(r.designId(), r.revisionId()));
        }
    }

    record RevisionLine(int number, String revisionId, String createdAt, String title, String link) {
        static RevisionLine of(String designId, HistoryEntry s) {
            return new RevisionLine(s.number(), s.revisionId(), s.createdAt().toString(), s.title(),
                    "/d/" + designId + "/r/" + s.revisionId());
        }
    }

    record Design(String designId, String latestRevisionId, List<RevisionLine> revisions, Revision latest) {
    }

    record Recomputed(String revisionId, String savedToolVersion, String currentToolVersion, boolean toolVersionDiffers,
                      boolean differs, @JsonInclude(JsonInclude.Include.NON_ABSENT) Optional<String> failure,
                      List<TreeDiff.Difference> changes,
                      @JsonInclude(JsonInclude.Include.NON_ABSENT) Optional<JsonNode> results) {
        static Recomputed of(Recomputation c) {
            return new Recomputed(c.revisionId(), c.savedToolVersion(), c.currentToolVersion(), c.toolVersionDiffers(),
                    c.differs(), c.failure(), c.changes(), c.results());
        }
    }

    record Demo(String slug, String designId, String latestRevisionId, String title, String link) {
    }
}
