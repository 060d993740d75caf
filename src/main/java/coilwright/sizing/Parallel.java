package coilwright.sizing;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.Function;

/** Maps a list on a fork-join pool, keeping the list's order, so the results do not depend on the thread count. */
final class Parallel {
    private Parallel() {
    }

    static <T, R> List<R> map(ForkJoinPool pool, List<T> items, Function<T, R> f) {
        try {
            return pool.submit(() -> items.parallelStream().map(f).toList()).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        }
    }
}
