package coilwright.web.api;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class ResponseCacheTest {
    private final AtomicInteger answered = new AtomicInteger();

    private byte[] echo(String body) {
        answered.incrementAndGet();
        return ("<" + body + ">").getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void an_identical_body_is_answered_once() {
        ResponseCache cache = new ResponseCache(1000);
        byte[] first = cache.get("{\"a\":1}", this::echo);
        assertSame(first, cache.get("{\"a\":1}", this::echo));
        assertEquals(1, answered.get());
        assertArrayEquals("<{\"a\":1}>".getBytes(StandardCharsets.UTF_8), first);
    }

    @Test
    void the_byte_budget_is_kept_by_dropping_the_least_recently_used() {
        // each entry: 2 bytes per key char (2 chars) + 4 value bytes = 8 bytes; the budget holds four
        ResponseCache cache = new ResponseCache(39);
        for (String key : new String[] {"aa", "bb", "cc", "dd"}) {
            cache.get(key, this::echo);
        }
        cache.get("aa", this::echo); // aa is now the most recent
        cache.get("ee", this::echo); // drops bb
        assertEquals(4, cache.size());
        assertEquals(32, cache.usedBytes());
        cache.get("aa", this::echo);
        assertEquals(5, answered.get(), "aa was kept");
        cache.get("bb", this::echo);
        assertEquals(6, answered.get(), "bb was dropped");
    }

    @Test
    void an_entry_over_a_quarter_of_the_budget_is_answered_but_not_kept() {
        ResponseCache cache = new ResponseCache(100);
        cache.get("x".repeat(20), this::echo);
        cache.get("x".repeat(20), this::echo);
        assertEquals(2, answered.get());
        assertEquals(0, cache.usedBytes());
    }

    @Test
    void failures_are_not_kept() {
        ResponseCache cache = new ResponseCache(1000);
        assertThrows(IllegalStateException.class, () -> cache.get("bad", b -> {
            throw new IllegalStateException("invalid");
        }));
        assertEquals(0, cache.size());
    }

    @Test
    void a_negative_budget_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> new ResponseCache(-1));
    }
}
