package coilwright.web.api;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * Response bytes of a route whose answer is a pure function of the request body text, kept least-recently-used
 * within a byte budget (keys and values counted). An identical body is answered without parsing, binding,
 * evaluating or serialising again. Only successful answers are stored: a thrown exception passes through.
 */
final class ResponseCache {
    private final long budgetBytes;
    private final long largestEntryBytes;
    private final LinkedHashMap<String, byte[]> entries = new LinkedHashMap<>(16, 0.75f, true);
    private long usedBytes;

    /** @param budgetBytes most bytes held; an entry over a quarter of it is never stored */
    ResponseCache(long budgetBytes) {
        if (budgetBytes < 0) {
            throw new IllegalArgumentException("budgetBytes = " + budgetBytes + ": must be >= 0");
        }
        this.budgetBytes = budgetBytes;
        this.largestEntryBytes = budgetBytes / 4;
    }

    /** The stored answer for {@code body}, or the newly computed one (stored when it fits). */
    byte[] get(String body, Function<String, byte[]> answer) {
        byte[] cached;
        synchronized (this) {
            cached = entries.get(body);
        }
        if (cached != null) {
            return cached;
        }
        byte[] value = answer.apply(body);
        store(body, value);
        return value;
    }

    private synchronized void store(String body, byte[] value) {
        long size = size(body, value);
        if (size > largestEntryBytes || entries.containsKey(body)) {
            return;
        }
        entries.put(body, value);
        usedBytes += size;
        for (Iterator<Map.Entry<String, byte[]>> it = entries.entrySet().iterator(); usedBytes > budgetBytes; ) {
            Map.Entry<String, byte[]> eldest = it.next();
            usedBytes -= size(eldest.getKey(), eldest.getValue());
            it.remove();
        }
    }

    synchronized long usedBytes() {
        return usedBytes;
    }

    synchronized int size() {
        return entries.size();
    }

    private static long size(String key, byte[] value) {
        return 2L * key.length() + value.length;
    }
}
