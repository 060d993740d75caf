package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class LruCacheTest {
    private final AtomicInteger computed = new AtomicInteger();

    private String square(Integer k) {
        computed.incrementAndGet();
        return Integer.toString(k * k);
    }

    @Test
    void a_repeated_key_is_computed_once() {
        LruCache<Integer, String> cache = new LruCache<>(4);
        assertEquals("9", cache.get(3, this::square));
        assertEquals("9", cache.get(3, this::square));
        assertEquals(1, computed.get());
    }

    @Test
    void the_least_recently_used_entry_is_dropped_first_and_size_stays_bounded() {
        LruCache<Integer, String> cache = new LruCache<>(2);
        cache.get(1, this::square);
        cache.get(2, this::square);
        cache.get(1, this::square); // 1 is now more recent than 2
        cache.get(3, this::square); // drops 2
        assertEquals(2, cache.size());
        assertEquals(3, computed.get());
        cache.get(1, this::square);
        assertEquals(3, computed.get(), "1 was kept");
        cache.get(2, this::square);
        assertEquals(4, computed.get(), "2 was dropped and is computed again");
    }

    @Test
    void capacity_zero_caches_nothing() {
        LruCache<Integer, String> cache = new LruCache<>(0);
        cache.get(5, this::square);
        cache.get(5, this::square);
        assertEquals(2, computed.get());
        assertEquals(0, cache.size());
    }

    @Test
    void exceptions_are_not_cached() {
        LruCache<Integer, String> cache = new LruCache<>(2);
        assertThrows(IllegalStateException.class, () -> cache.get(1, k -> {
            throw new IllegalStateException("no");
        }));
        assertEquals("1", cache.get(1, this::square));
    }

    @Test
    void a_negative_capacity_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> new LruCache<Integer, String>(-1));
    }
}
