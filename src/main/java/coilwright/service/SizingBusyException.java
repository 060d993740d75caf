package coilwright.service;

/** Too many design searches are running as jobs: the client should try again later (HTTP 429). */
public final class SizingBusyException extends RuntimeException {
    private final int retryAfterS;

    public SizingBusyException(String message, int retryAfterS) {
        super(message);
        this.retryAfterS = retryAfterS;
    }

    /** Seconds after which a retry may succeed. */
    public int retryAfterS() {
        return retryAfterS;
    }
}
