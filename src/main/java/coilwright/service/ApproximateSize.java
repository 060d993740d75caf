package coilwright.service;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.RecordComponent;
import java.util.Collection;
import java.util.Map;
import java.util.Optional;

/**
 * The approximate heap size of a request or result, for weighing cache entries: records, lists, maps, optionals,
 * strings, arrays and boxed numbers are walked; object headers count 16 bytes, references 8 (a 64-bit JVM without
 * compressed pointers, so the figure errs on the large side). Enum constants and other shared objects count one
 * reference. Not exact and not meant to be: it only has to rank a 1000-point evaluation far above a winding layout.
 */
final class ApproximateSize {
    static final int HEADER = 16;
    static final int REFERENCE = 8;
    /** Deeper than any input or result of the service; stops a pathological structure from recursing forever. */
    private static final int MAX_DEPTH = 64;

    private static final ClassValue<Method[]> ACCESSORS = new ClassValue<>() {
        @Override
        protected Method[] computeValue(Class<?> type) {
            RecordComponent[] components = type.getRecordComponents();
            Method[] out = new Method[components.length];
            for (int i = 0; i < components.length; i++) {
                out[i] = components[i].getAccessor();
                out[i].setAccessible(true);
            }
            return out;
        }
    };

    private ApproximateSize() {
    }

    /** Bytes taken by {@code value} and everything it holds (0 for null). */
    static long of(Object value) {
        return of(value, 0);
    }

    private static long of(Object value, int depth) {
        if (value == null || value instanceof Enum<?> || depth > MAX_DEPTH) {
            return 0;
        }
        if (value instanceof String s) {
            return HEADER + REFERENCE + HEADER + (long) s.length();
        }
        if (value instanceof Number || value instanceof Boolean || value instanceof Character) {
            return HEADER + 8;
        }
        if (value instanceof double[] a) {
            return HEADER + 8L * a.length;
        }
        if (value instanceof int[] a) {
            return HEADER + 4L * a.length;
        }
        if (value instanceof Object[] a) {
            return HEADER + elements(java.util.Arrays.asList(a), depth);
        }
        if (value instanceof Collection<?> c) {
            return HEADER + elements(c, depth);
        }
        if (value instanceof Map<?, ?> m) {
            long sum = HEADER;
            for (Map.Entry<?, ?> e : m.entrySet()) {
                sum += HEADER + 2L * REFERENCE + of(e.getKey(), depth + 1) + of(e.getValue(), depth + 1);
            }
            return sum;
        }
        if (value instanceof Optional<?> o) {
            return HEADER + REFERENCE + of(o.orElse(null), depth + 1);
        }
        if (value.getClass().isRecord()) {
            return record(value, depth);
        }
        return HEADER;
    }

    private static long elements(Collection<?> c, int depth) {
        long sum = 0;
        for (Object o : c) {
            sum += REFERENCE + of(o, depth + 1);
        }
        return sum;
    }

    private static long record(Object value, int depth) {
        long sum = HEADER;
        for (Method accessor : ACCESSORS.get(value.getClass())) {
            Class<?> type = accessor.getReturnType();
            if (type.isPrimitive()) {
                sum += type == double.class || type == long.class ? 8 : 4;
                continue;
            }
            try {
                sum += REFERENCE + of(accessor.invoke(value), depth + 1);
            } catch (IllegalAccessException | InvocationTargetException e) {
                sum += REFERENCE;
            }
        }
        return sum;
    }
}
