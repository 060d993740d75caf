package coilwright.store;

import coilwright.validation.Checks;

/**
 * What the author asks to save: the design's input (already canonical JSON, stored and hashed as given),
 * a title and notes, and the snapshot of results the author saw with the tool version that computed them.
 *
 * <p>Limits: {@code title} at most {@value #MAX_TITLE_CHARS} characters, {@code notes} at most
 * {@value #MAX_NOTES_CHARS}, {@code inputJson} 1 byte to {@value #MAX_INPUT_JSON_BYTES} bytes of UTF-8,
 * {@code resultJson} at most {@value #MAX_RESULT_JSON_BYTES} bytes, {@code toolVersion} 1 to
 * {@value #MAX_TOOL_VERSION_CHARS} characters, {@code schemaVersion} 1 to 1000. Text must be valid Unicode
 * without NUL characters (PostgreSQL cannot store NUL, and a lone surrogate would not survive UTF-8 intact).
 * Characters are counted as Java {@code char}s (UTF-16 code units).
 */
public record DraftRevision(String title, String notes, String inputJson, String resultJson, String toolVersion,
                            int schemaVersion) {
    public static final int MAX_TITLE_CHARS = 200;
    public static final int MAX_NOTES_CHARS = 20_000;
    public static final int MAX_INPUT_JSON_BYTES = 256 * 1024;
    public static final int MAX_RESULT_JSON_BYTES = 16 * 1024 * 1024;
    public static final int MAX_TOOL_VERSION_CHARS = 100;

    public DraftRevision {
        Checks c = new Checks();
        c.present("title", title).present("notes", notes).present("inputJson", inputJson)
                .present("resultJson", resultJson).present("toolVersion", toolVersion);
        if (title != null) {
            c.require(title.length() <= MAX_TITLE_CHARS, "title", title.length() + " characters",
                    "must be at most " + MAX_TITLE_CHARS + " characters", "0 to " + MAX_TITLE_CHARS + " characters");
            cleanText(c, "title", title);
        }
        if (notes != null) {
            c.require(notes.length() <= MAX_NOTES_CHARS, "notes", notes.length() + " characters",
                    "must be at most " + MAX_NOTES_CHARS + " characters", "0 to " + MAX_NOTES_CHARS + " characters");
            cleanText(c, "notes", notes);
        }
        if (inputJson != null) {
            int bytes = utf8Length(inputJson);
            c.require(bytes >= 1 && bytes <= MAX_INPUT_JSON_BYTES, "inputJson", bytes + " bytes",
                    "must be 1 to " + MAX_INPUT_JSON_BYTES + " bytes (256 KiB) of UTF-8",
                    "1 to " + MAX_INPUT_JSON_BYTES + " bytes");
            cleanText(c, "inputJson", inputJson);
        }
        if (resultJson != null) {
            int bytes = utf8Length(resultJson);
            c.require(bytes <= MAX_RESULT_JSON_BYTES, "resultJson", bytes + " bytes",
                    "must be at most " + MAX_RESULT_JSON_BYTES + " bytes (16 MiB) of UTF-8",
                    "0 to " + MAX_RESULT_JSON_BYTES + " bytes");
            cleanText(c, "resultJson", resultJson);
        }
        if (toolVersion != null) {
            c.require(!toolVersion.isBlank() && toolVersion.length() <= MAX_TOOL_VERSION_CHARS, "toolVersion",
                    toolVersion, "must be 1 to " + MAX_TOOL_VERSION_CHARS + " characters",
                    "1 to " + MAX_TOOL_VERSION_CHARS + " characters");
            cleanText(c, "toolVersion", toolVersion);
        }
        c.intRange("schemaVersion", schemaVersion, 1, 1000);
        c.throwIfAny();
    }

    /** True when title, notes and input equal {@code other}'s: the content that identifies a revision. */
    public boolean sameContentAs(String otherTitle, String otherNotes, String otherInputJson) {
        return title.equals(otherTitle) && notes.equals(otherNotes) && inputJson.equals(otherInputJson);
    }

    private static void cleanText(Checks c, String field, String text) {
        int bad = firstInvalidChar(text);
        c.require(bad < 0, field, "character at index " + bad,
                "must be valid Unicode text without NUL characters or unpaired surrogates",
                "Unicode text without U+0000");
    }

    /** Index of the first NUL or unpaired surrogate, or -1. */
    static int firstInvalidChar(String s) {
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (ch == 0) {
                return i;
            }
            if (Character.isHighSurrogate(ch)) {
                if (i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                    i++;
                    continue;
                }
                return i;
            }
            if (Character.isLowSurrogate(ch)) {
                return i;
            }
        }
        return -1;
    }

    /** UTF-8 length without encoding (valid surrogate pairs count 4 bytes). */
    static int utf8Length(String s) {
        long n = 0;
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (ch < 0x80) {
                n++;
            } else if (ch < 0x800) {
                n += 2;
            } else if (Character.isHighSurrogate(ch) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                n += 4;
                i++;
            } else {
                n += 3;
            }
        }
        return (int) Math.min(n, Integer.MAX_VALUE);
    }
}
