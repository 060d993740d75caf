package coilwright.service;

/**
 * The saved designs cannot be reached just now (HTTP 503): the database is down or unreachable. Nothing was
 * changed; everything that does not read or write saved designs keeps working, and saving works again by itself
 * once the database answers.
 */
public class DesignStoreUnavailableException extends RuntimeException {
    public DesignStoreUnavailableException(String message, Throwable cause) {
        super(message, cause);
    }
}
