package coilwright.web;

/** A request body that is not well-formed JSON (HTTP 400); the message says where it breaks. */
public class MalformedJsonException extends RuntimeException {
    private final long line;
    private final long column;

    public MalformedJsonException(String detail, long line, long column) {
        super(detail);
        this.line = line;
        this.column = column;
    }

    /** 1-based line of the fault, or 0 when unknown (e.g. an empty body). */
    public long line() {
        return line;
    }

    /** 1-based column of the fault, or 0 when unknown. */
    public long column() {
        return column;
    }
}
