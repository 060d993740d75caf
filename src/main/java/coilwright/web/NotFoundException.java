package coilwright.web;

/** A resource (saved design, catalogue entry, ...) that does not exist: HTTP 404. */
public class NotFoundException extends RuntimeException {
    public NotFoundException(String detail) {
        super(detail);
    }
}
