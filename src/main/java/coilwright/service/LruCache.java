package coilwright.service;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * A small thread-safe least-recently-used cache for pure functions: at most {@code capacity} entries, the least
 * recently used one dropped first. A value is computed outside the lock, so two threads asking for the same new
 * key may both compute it (harmless for a pure function); exceptions are not cached.
 *
 * @param <K> key with value-based equals and hashCode (a record)
 * @param <V> immutable value
 */
final class LruCache<K, V> {
    private final int capacity;
    private final LinkedHashMap<K, V> entries;

    /** @param capacity most entries kept, 0 to cache nothing */
    LruCache(int capacity) {
        if (capacity < 0) {
            throw new IllegalArgumentException("capacity = " + capacity + ": must be >= 0");
        }
        this.capacity = capacity;
        this.entries = new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<K, V> eldest) {
                return size() > LruCache.this.capacity;
            }
        };
    }

    /** The cached value for {@code key}, or the newly computed one (then cached). */
    V get(K key, Function<K, V> compute) {
        V cached;
        synchronized (this) {
            cached = entries.get(key);
        }
        if (cached != null) {
            return cached;
        }
        V value = compute.apply(key);
        if (capacity > 0) {
            synchronized (this) {
                entries.put(key, value);
            }
        }
        return value;
    }

    synchronized int size() {
        return entries.size();
    }
}
