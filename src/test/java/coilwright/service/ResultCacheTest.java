package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class ResultCacheTest {
    record Request(int n) {
    }

    record Other(int n) {
    }

    record Result(List<Double> values) {
    }

    private static Result result(int points) {
        return new Result(java.util.Collections.nCopies(points, 1.0));
    }

    @Test
    void an_equal_request_is_answered_from_the_cache_and_computed_once() {
        ResultCache cache = new ResultCache(1_000_000);
        AtomicInteger computed = new AtomicInteger();
        Result first = cache.get(new Request(1), r -> {
            computed.incrementAndGet();
            return result(10);
        });
        Result second = cache.get(new Request(1), r -> {
            computed.incrementAndGet();
            return result(10);
        });
        assertSame(first, second, "an equal but separately built request hits the cache");
        assertEquals(1, computed.get());
    }

    @Test
    void requests_of_different_types_never_share_an_entry() {
        ResultCache cache = new ResultCache(1_000_000);
        String a = cache.get(new Request(1), r -> "request");
        String b = cache.get(new Other(1), r -> "other");
        assertEquals("request", a);
        assertEquals("other", b);
        assertEquals(2, cache.size());
    }

    @Test
    void entries_are_weighed_by_size_and_the_budget_holds() {
        long oneLarge = ResultCache.weight(new Request(0), result(1000));
        long oneSmall = ResultCache.weight(new Request(0), result(10));
        assertTrue(oneLarge > 50 * oneSmall / 10, "a 1000-point result weighs far more than a 10-point one");
        ResultCache cache = new ResultCache(3 * oneLarge);
        for (int i = 0; i < 10; i++) {
            int n = i;
            cache.get(new Request(n), r -> result(1000));
        }
        assertTrue(cache.weightBytes() <= 3 * oneLarge, cache.weightBytes() + " > " + 3 * oneLarge);
        assertTrue(cache.size() <= 3, "at most three large results fit, held " + cache.size());
        assertTrue(cache.size() >= 1);
    }

    @Test
    void a_result_larger_than_the_budget_is_returned_but_not_kept() {
        ResultCache cache = new ResultCache(ResultCache.weight(new Request(0), result(10)));
        assertEquals(1000, cache.get(new Request(1), r -> result(1000)).values().size());
        assertEquals(0, cache.size());
    }

    @Test
    void a_zero_budget_caches_nothing() {
        ResultCache cache = new ResultCache(0);
        AtomicInteger computed = new AtomicInteger();
        cache.get(new Request(1), r -> computed.incrementAndGet());
        cache.get(new Request(1), r -> computed.incrementAndGet());
        assertEquals(2, computed.get());
    }

    @Test
    void a_failure_is_not_cached() {
        ResultCache cache = new ResultCache(1_000_000);
        assertThrows(IllegalStateException.class, () -> cache.get(new Request(1), r -> {
            throw new IllegalStateException("refused");
        }));
        assertEquals("computed", cache.get(new Request(1), r -> "computed"));
    }

    @Test
    void a_negative_budget_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> new ResultCache(-1));
    }
}
