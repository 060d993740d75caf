package coilwright.web;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import coilwright.validation.FieldError;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.OptionalLong;
import java.util.stream.Collectors;

/** Type checks and converts one JSON value for {@link RecordBinder}, adding a field error when it does not fit. */
final class JsonLeaves {
    private final ObjectMapper mapper;
    private final RecordBinder records;

    JsonLeaves(ObjectMapper mapper, RecordBinder records) {
        this.mapper = mapper;
        this.records = records;
    }

    /** A record component: absent or null is allowed only for the Optional types. */
    Object bindComponent(JsonNode node, Type type, String path, List<FieldError> errors) {
        Class<?> raw = raw(type);
        if (node == null || node.isNull()) {
            if (raw == Optional.class) return Optional.empty();
            if (raw == OptionalDouble.class) return OptionalDouble.empty();
            if (raw == OptionalInt.class) return OptionalInt.empty();
            if (raw == OptionalLong.class) return OptionalLong.empty();
            errors.add(new FieldError(path, "missing", path + " is missing: a value is required", describe(type)));
            return RecordBinder.FAILED;
        }
        return bind(node, type, path, errors);
    }

    Object bind(JsonNode node, Type type, String path, List<FieldError> errors) {
        Class<?> raw = raw(type);
        if (raw == Optional.class) return wrap(bind(node, arg(type), path, errors), Optional::of);
        if (raw == OptionalDouble.class) return wrap(bind(node, double.class, path, errors), v -> OptionalDouble.of((Double) v));
        if (raw == OptionalInt.class) return wrap(bind(node, int.class, path, errors), v -> OptionalInt.of((Integer) v));
        if (raw == OptionalLong.class) return wrap(bind(node, long.class, path, errors), v -> OptionalLong.of((Long) v));
        if (List.class == raw || Collection.class == raw) return list(node, arg(type), path, errors);
        if (raw.isSealed()) return variant(node, raw, path, errors);
        if (raw.isArray() && node.isArray() && node.size() > MAX_LIST_ITEMS) return tooLong(node, path, errors);
        String expected = describe(type);
        boolean fits = raw.isRecord() ? node.isObject()
                : isDecimal(raw) || isWhole(raw) ? node.isNumber()
                : raw == boolean.class || raw == Boolean.class ? node.isBoolean()
                : raw == String.class || raw.isEnum() ? node.isTextual()
                : true;
        if (!fits) {
            return fail(path, node, "must be " + expected, expected, errors);
        }
        if (raw.isRecord()) return records.bindRecord(node, raw, path, errors);
        if (isDecimal(raw) && !Double.isFinite(raw == float.class || raw == Float.class
                ? node.floatValue() : node.doubleValue())) {
            return fail(path, node, "must be a finite number", expected, errors);
        }
        if (isWhole(raw) && !node.isIntegralNumber()) return fail(path, node, "must be a whole number", expected, errors);
        if ((raw == int.class || raw == Integer.class) && !node.canConvertToInt()
                || (raw == long.class || raw == Long.class) && !node.canConvertToLong()) {
            return fail(path, node, "is out of range", expected, errors);
        }
        if (raw.isEnum() && Arrays.stream(raw.getEnumConstants()).noneMatch(e -> ((Enum<?>) e).name().equals(node.textValue()))) {
            return fail(path, node, "must be " + expected, expected, errors);
        }
        try {
            return mapper.treeToValue(node, mapper.constructType(type));
        } catch (Exception e) {
            return fail(path, node, "cannot be read as " + raw.getSimpleName(), expected, errors);
        }
    }

    /**
     * A sealed interface of records: the object names its variant in {@code "type"} (the record's simple name), the
     * same property {@link Json} writes.
     */
    private Object variant(JsonNode node, Class<?> sealed, String path, List<FieldError> errors) {
        if (!node.isObject()) {
            return fail(path, node, "must be a JSON object", "a JSON object with \"type\"", errors);
        }
        String allowed = "one of " + Arrays.stream(sealed.getPermittedSubclasses()).map(Class::getSimpleName)
                .collect(Collectors.joining(", "));
        JsonNode typeNode = node.get(Json.TYPE_PROPERTY);
        String typePath = path.isEmpty() ? Json.TYPE_PROPERTY : path + "." + Json.TYPE_PROPERTY;
        if (typeNode == null || !typeNode.isTextual()) {
            errors.add(new FieldError(typePath, typeNode == null ? "missing" : text(typeNode),
                    typePath + " is missing: name the kind, " + allowed, allowed));
            return RecordBinder.FAILED;
        }
        for (Class<?> variant : sealed.getPermittedSubclasses()) {
            if (variant.getSimpleName().equals(typeNode.textValue()) && variant.isRecord()) {
                com.fasterxml.jackson.databind.node.ObjectNode body = ((com.fasterxml.jackson.databind.node.ObjectNode) node).deepCopy();
                body.remove(Json.TYPE_PROPERTY);
                return records.bindRecord(body, variant, path, errors);
            }
        }
        return fail(typePath, typeNode, "must be " + allowed, allowed, errors);
    }

    /**
     * The most items any list of a request may hold (table rows, curve points, measurements): the work a request may
     * ask for is bounded, and every example and realistic table is far shorter.
     */
    public static final int MAX_LIST_ITEMS = 200;

    private Object list(JsonNode node, Type element, String path, List<FieldError> errors) {
        if (!node.isArray()) {
            return fail(path, node, "must be a JSON array", "an array", errors);
        }
        if (node.size() > MAX_LIST_ITEMS) {
            return tooLong(node, path, errors);
        }
        List<Object> out = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < node.size(); i++) {
            Object v = bindComponent(node.get(i), element, path + "[" + i + "]", errors);
            ok &= v != RecordBinder.FAILED;
            out.add(v);
        }
        return ok ? List.copyOf(out) : RecordBinder.FAILED;
    }

    private static Object tooLong(JsonNode node, String path, List<FieldError> errors) {
        String p = path.isEmpty() ? "body" : path;
        errors.add(new FieldError(p, node.size() + " items", p + " has " + node.size() + " items: at most "
                + MAX_LIST_ITEMS + " are allowed in any list", "at most " + MAX_LIST_ITEMS + " items"));
        return RecordBinder.FAILED;
    }

    private static Object fail(String path, JsonNode node, String why, String allowed, List<FieldError> errors) {
        String p = path.isEmpty() ? "body" : path;
        String shown = node.toString();
        shown = shown.length() > 80 ? shown.substring(0, 77) + "..." : shown;
        errors.add(new FieldError(p, text(node), p + " = " + shown + ": " + why, allowed));
        return RecordBinder.FAILED;
    }

    private static Object wrap(Object v, java.util.function.Function<Object, Object> f) {
        return v == RecordBinder.FAILED ? v : f.apply(v);
    }

    /** What a value of this type looks like, for "allowed" texts. */
    static String describe(Type type) {
        Class<?> raw = raw(type);
        if (raw.isEnum()) {
            return "one of " + Arrays.stream(raw.getEnumConstants()).map(e -> ((Enum<?>) e).name())
                    .collect(Collectors.joining(", "));
        }
        if (isDecimal(raw)) return "a finite number";
        if (raw == int.class || raw == Integer.class) return "a whole number";
        if (isWhole(raw)) return "a whole number";
        if (raw == boolean.class || raw == Boolean.class) return "true or false";
        if (raw == String.class) return "a string";
        if (raw.isRecord()) return "a JSON object";
        if (raw.isSealed()) return "a JSON object with \"type\"";
        if (List.class == raw || Collection.class == raw) return "an array";
        return "a " + raw.getSimpleName();
    }

    static String text(JsonNode node) {
        String s = node.isTextual() ? node.textValue() : node.toString();
        return s.length() > 60 ? s.substring(0, 57) + "..." : s;
    }

    /** Numbers, booleans, strings and enums: values a constructor cannot be given as null. */
    static boolean isScalar(Class<?> c) {
        return isDecimal(c) || isWhole(c) || c == Boolean.class || c == String.class || c.isEnum();
    }

    private static boolean isDecimal(Class<?> c) {
        return c == double.class || c == Double.class || c == float.class || c == Float.class;
    }

    private static boolean isWhole(Class<?> c) {
        return c == int.class || c == Integer.class || c == long.class || c == Long.class
                || c == short.class || c == Short.class;
    }

    private static Class<?> raw(Type type) {
        if (type instanceof Class<?> c) return c;
        if (type instanceof ParameterizedType p) return (Class<?>) p.getRawType();
        return Object.class;
    }

    private static Type arg(Type type) {
        return type instanceof ParameterizedType p ? p.getActualTypeArguments()[0] : Object.class;
    }
}
