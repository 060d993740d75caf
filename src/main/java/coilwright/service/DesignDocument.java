package coilwright.service;

import coilwright.system.EvaluationRequest;
import coilwright.validation.Checks;

/**
 * A design as a file: the examples, exports and imports all use this shape.
 *
 * @param schemaVersion the file format version ({@link #SCHEMA_VERSION})
 * @param title         a short name (1 to 200 characters)
 * @param notes         free text (up to 20 000 characters)
 * @param design        the alternator, its load and the speeds to evaluate
 */
public record DesignDocument(int schemaVersion, String title, String notes, EvaluationRequest design) {
    public static final int SCHEMA_VERSION = 1;

    public DesignDocument {
        Checks c = new Checks().intRange("schemaVersion", schemaVersion, 1, SCHEMA_VERSION)
                .present("title", title).present("design", design);
        if (title != null) {
            c.require(!title.isBlank() && title.length() <= 200, "title", title, "must be 1 to 200 characters", "1 to 200 characters");
        }
        notes = notes == null ? "" : notes;
        c.require(notes.length() <= 20_000, "notes", notes.length() + " characters", "must be at most 20000 characters", "<= 20000 characters");
        c.throwIfAny();
    }
}
