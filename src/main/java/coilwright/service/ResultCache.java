package coilwright.service;

import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import java.util.function.Function;

/**
 * The service's one cache of computed results. Every calculation the facade offers is a pure function of its bound
 * request record (value equality, immutable), so an equal request, however it arrived (API body, page form, a
 * differently spaced JSON text), is answered with the result computed before. Entries are weighed by their
 * {@linkplain ApproximateSize approximate size}, request and result together, and the least useful are dropped
 * (Caffeine's size-based eviction) when the budget is used up. Failures are never cached: the exception passes
 * through and the next equal request computes again.
 */
public final class ResultCache {
    /**
     * About 16 MB of results: a 200-point evaluation weighs about 40 kB (some 180 bytes a speed point plus the
     * machine), the largest (1000 points) about 0.2 MB, so some four hundred of the one or eighty of the other.
     */
    public static final long DEFAULT_BUDGET_BYTES = 16L * 1024 * 1024;

    private final Cache<Record, Object> entries;

    /** @param budgetBytes most approximate bytes held; 0 caches nothing */
    public ResultCache(long budgetBytes) {
        if (budgetBytes < 0) {
            throw new IllegalArgumentException("budgetBytes = " + budgetBytes + ": must be >= 0");
        }
        this.entries = Caffeine.newBuilder()
                .maximumWeight(budgetBytes)
                .weigher((Record request, Object result) -> weight(request, result))
                // evict on the calling thread: the budget holds as soon as get returns, not some time later
                .executor(Runnable::run)
                .build();
    }

    /**
     * The result for {@code request}: the cached one, or {@code compute}'s (then cached). Two threads asking for the
     * same new request wait for one computation.
     *
     * @param request a bound request record; records of different types never match each other
     */
    public <K extends Record, V> V get(K request, Function<K, V> compute) {
        @SuppressWarnings("unchecked")
        V value = (V) entries.get(request, k -> compute.apply(request));
        return value;
    }

    /** Entries held now. */
    public long size() {
        entries.cleanUp();
        return entries.estimatedSize();
    }

    /** Approximate bytes held now. */
    public long weightBytes() {
        entries.cleanUp();
        return entries.policy().eviction().map(e -> e.weightedSize().orElse(0)).orElse(0L);
    }

    static int weight(Record request, Object result) {
        return (int) Math.min(Integer.MAX_VALUE, ApproximateSize.of(request) + ApproximateSize.of(result));
    }
}
