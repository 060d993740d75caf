package coilwright.store;

import java.util.Objects;
import java.util.Optional;

/**
 * The answer to a save.
 *
 * @param designId   the design's permanent id (link {@code /d/{designId}} shows its latest revision)
 * @param revisionId the id of the revision that holds the saved content (its own permanent link)
 * @param editToken  the secret edit token; present only when this call created the design, and never again
 * @param created    true when this call stored something new, false when a revision repeated the latest one
 */
public record SaveOutcome(String designId, String revisionId, Optional<String> editToken, boolean created) {
    public SaveOutcome {
        Objects.requireNonNull(designId, "designId");
        Objects.requireNonNull(revisionId, "revisionId");
        Objects.requireNonNull(editToken, "editToken");
    }
}
