package coilwright.service;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.List;
import java.util.Optional;

/**
 * What the current tool computes from a saved revision's input, against the snapshot saved with it.
 *
 * @param revisionId         the revision recomputed
 * @param savedToolVersion   the tool version that computed the saved snapshot
 * @param currentToolVersion the tool version running now
 * @param results            the recomputed results, or empty when the current tool could not compute them
 * @param failure            why the current tool could not compute them, or empty
 * @param changes            saved numbers the recomputation does not reproduce (relative tolerance
 *                           {@link DesignLibrary#RECOMPUTE_TOLERANCE})
 */
public record Recomputation(String revisionId, String savedToolVersion, String currentToolVersion,
                            Optional<JsonNode> results, Optional<String> failure, List<TreeDiff.Difference> changes) {
    public Recomputation {
        changes = List.copyOf(changes);
    }

    /** True when the current tool does not reproduce the saved numbers (or cannot compute them at all). */
    public boolean differs() {
        return failure.isPresent() || !changes.isEmpty();
    }

    /** True when the saved snapshot was computed by another version of the tool. */
    public boolean toolVersionDiffers() {
        return !savedToolVersion.equals(currentToolVersion);
    }
}
