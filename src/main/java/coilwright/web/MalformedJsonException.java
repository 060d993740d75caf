package coilwright.web;

/**
 * A request body that is not well-formed JSON (HTTP 400). The message is ours, never the parser's: where the text
 * breaks (line, column and the path of the value being read) and what was expected there.
 */
public class MalformedJsonException extends RuntimeException {
    private final long line;
    private final long column;
    private final String path;

    /**
     * @param path dotted path of the value being read ({@code alternator.winding.slots}), empty at the top level
     */
    public MalformedJsonException(String detail, long line, long column, String path) {
        super(detail);
        this.line = line;
        this.column = column;
        this.path = path;
    }

    /** 1-based line of the fault, or 0 when unknown (e.g. an empty body). */
    public long line() {
        return line;
    }

    /** 1-based column of the fault, or 0 when unknown. */
    public long column() {
        return column;
    }

    /** Dotted path of the value being read, or an empty string at the top level. */
    public String path() {
        return path;
    }
}
