package coilwright.validation;

/**
 * A per-thread time budget for one calculation: the caller opens it around a request ({@link #open}), and the long
 * loops of the model (the speed sweep, the curve of a match) {@link #check} it once per operating point. A calculation
 * that overruns stops with a {@link SolverFailedException} (HTTP 422) that names the field that sets its size, instead of
 * holding a core for as long as it asks. Without an open budget, {@link #check} does nothing.
 */
public final class TimeBudget implements AutoCloseable {
    private static final ThreadLocal<TimeBudget> CURRENT = new ThreadLocal<>();

    private final long deadlineNanos;
    private final long millis;
    private final TimeBudget outer;

    private TimeBudget(long millis, TimeBudget outer) {
        this.millis = millis;
        this.deadlineNanos = System.nanoTime() + millis * 1_000_000L;
        this.outer = outer;
    }

    /** Opens a budget of {@code millis} for this thread until {@link #close}. */
    public static TimeBudget open(long millis) {
        if (millis <= 0) {
            throw new IllegalArgumentException("millis = " + millis + ": must be > 0");
        }
        TimeBudget b = new TimeBudget(millis, CURRENT.get());
        CURRENT.set(b);
        return b;
    }

    /**
     * @param field the input that sets the amount of work (named in the failure)
     * @throws SolverFailedException when this thread's open budget is spent
     */
    public static void check(String field) {
        TimeBudget b = CURRENT.get();
        if (b != null && System.nanoTime() - b.deadlineNanos > 0) {
            throw new SolverFailedException(field, "the calculation needed more than the " + b.millis / 1000.0
                    + " s this service allows for one request: ask for fewer points or a narrower range");
        }
    }

    @Override
    public void close() {
        if (outer == null) {
            CURRENT.remove();
        } else {
            CURRENT.set(outer);
        }
    }
}
