package coilwright.web;

/** A request the caller may not make, e.g. a wrong edit token: HTTP 403. */
public class ForbiddenException extends RuntimeException {
    public ForbiddenException(String detail) {
        super(detail);
    }
}
