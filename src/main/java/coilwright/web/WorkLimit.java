package coilwright.web;

import coilwright.validation.TimeBudget;
import io.javalin.http.Handler;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Bounds the expensive requests (evaluations, matches, rewinds, saves that evaluate) computed at once, so that a few
 * clients cannot hold every core and {@code /health}, static files and plain pages stay fast under overload. A request
 * beyond the limit waits for its turn at most {@code waitMillis}; one that does not get it in time, or finds more
 * than {@code 64 × limit} already waiting, is answered 503 with {@code Retry-After} at once. An admitted one runs under a
 * {@link TimeBudget}: the model's loops stop it with a 422 once it is spent.
 */
public final class WorkLimit {
    private final Semaphore permits;
    private final int limit;
    private final int maxWaiting;
    private final long waitMillis;
    private final long budgetMillis;
    private final AtomicInteger waiting = new AtomicInteger();

    /** The time one admitted calculation may take before it stops with a 422 ({@link TimeBudget}). */
    public static final long DEFAULT_BUDGET_MILLIS = 20_000;

    public WorkLimit(int limit, long waitMillis) {
        this(limit, waitMillis, DEFAULT_BUDGET_MILLIS);
    }

    /** As above with another time budget per admitted calculation. */
    public WorkLimit(int limit, long waitMillis, long budgetMillis) {
        if (limit < 1) {
            throw new IllegalArgumentException("limit = " + limit + ": must be >= 1");
        }
        this.limit = limit;
        this.permits = new Semaphore(limit, true);
        this.maxWaiting = 64 * limit;
        this.waitMillis = waitMillis;
        this.budgetMillis = budgetMillis;
    }

    /** The handler, run only while holding one of the permits. */
    public Handler guard(Handler handler) {
        return ctx -> {
            acquire();
            try (TimeBudget budget = TimeBudget.open(budgetMillis)) {
                handler.handle(ctx);
            } finally {
                permits.release();
            }
        };
    }

    /** Expensive requests being computed now. */
    public int inFlight() {
        return limit - permits.availablePermits();
    }

    private void acquire() {
        if (permits.tryAcquire()) {
            return;
        }
        if (waiting.incrementAndGet() > maxWaiting) {
            waiting.decrementAndGet();
            throw busy();
        }
        try {
            if (!permits.tryAcquire(waitMillis, TimeUnit.MILLISECONDS)) {
                throw busy();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw busy();
        } finally {
            waiting.decrementAndGet();
        }
    }

    private static RefusedRequestException busy() {
        return new RefusedRequestException(503, "busy", "The service is busy with other calculations;"
                + " please try again in a moment.", 1);
    }
}
