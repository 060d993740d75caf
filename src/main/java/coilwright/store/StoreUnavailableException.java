package coilwright.store;

/**
 * The database cannot be reached just now (connection refused or lost, no free connection within the pool's
 * timeout, the server shutting down). Nothing was changed by the failed call; the pool reconnects by itself once
 * the database answers again.
 */
public class StoreUnavailableException extends StoreException {
    public StoreUnavailableException(String message, Throwable cause) {
        super(message, cause);
    }
}
