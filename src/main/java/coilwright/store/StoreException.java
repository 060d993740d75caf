package coilwright.store;

/** The database failed (unreachable, full, or a persistent conflict); the API answers 500 or 503. */
public class StoreException extends RuntimeException {
    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }
}
