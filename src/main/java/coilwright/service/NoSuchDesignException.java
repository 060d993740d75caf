package coilwright.service;

/** No saved design or revision has the given id (HTTP 404). Malformed ids are reported the same way. */
public class NoSuchDesignException extends RuntimeException {
    public NoSuchDesignException(String message) {
        super(message);
    }
}
