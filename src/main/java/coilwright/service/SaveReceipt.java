package coilwright.service;

import coilwright.store.SaveOutcome;

import java.util.Objects;
import java.util.Optional;

/**
 * The answer to a save or a revision.
 *
 * @param designId   the design's permanent id (link {@code /d/{designId}} shows its latest revision)
 * @param revisionId the id of the revision that holds the saved content (its own permanent link)
 * @param editToken  the secret edit token: present only in the answer that created the design, never again
 * @param created    true when something new was stored; false when a revision repeated the latest one
 */
public record SaveReceipt(String designId, String revisionId, Optional<String> editToken, boolean created) {
    public SaveReceipt {
        Objects.requireNonNull(designId, "designId");
        Objects.requireNonNull(revisionId, "revisionId");
        Objects.requireNonNull(editToken, "editToken");
    }

    static SaveReceipt of(SaveOutcome o) {
        return new SaveReceipt(o.designId(), o.revisionId(), o.editToken(), o.created());
    }
}
