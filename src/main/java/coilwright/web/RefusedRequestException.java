package coilwright.web;

/**
 * A request refused before any calculation, for what it is rather than what it says: a body of the wrong media type
 * (415), a malformed multipart body (400), a body over the limit (413), or too much work in flight (503).
 * {@link ErrorMapping} answers it as a problem with this status, slug and detail.
 */
public final class RefusedRequestException extends RuntimeException {
    private final int status;
    private final String slug;
    private final int retryAfterSeconds;

    public RefusedRequestException(int status, String slug, String detail) {
        this(status, slug, detail, 0);
    }

    /** As above with a {@code Retry-After} in seconds (0 for none). */
    public RefusedRequestException(int status, String slug, String detail, int retryAfterSeconds) {
        super(detail, null, false, false);
        this.status = status;
        this.slug = slug;
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public int status() {
        return status;
    }

    public String slug() {
        return slug;
    }

    public int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
