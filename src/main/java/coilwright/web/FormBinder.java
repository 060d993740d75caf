package coilwright.web;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.units.Quantity;
import coilwright.web.units.Units;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Maps HTML form fields with dotted names ({@code rotor.airGapM}, {@code coils[0].turns}) into the same
 * JSON tree the API takes, then binds it with {@link RecordBinder}: pages and API share every validation
 * message. Numbers entered in imperial units are converted to SI here, at the edge, for the fields
 * named in {@code fieldUnits}. Blank fields count as missing; an unchecked checkbox is {@code false};
 * fields the record does not have (buttons, the units switch) are ignored.
 */
public final class FormBinder {
    private final RecordBinder binder;
    private final FormTree tree = new FormTree();

    public FormBinder(RecordBinder binder) {
        this.binder = binder;
    }

    /**
     * Binds SI form fields.
     *
     * @throws InvalidInputException listing every invalid field (shown on the page by {@link ErrorMapping})
     * @throws InfeasibleDesignException when a record finds the input physically impossible
     */
    public <T> T bind(Map<String, List<String>> form, Class<T> type) {
        return bind(form, type, Units.SI, Map.of());
    }

    /**
     * As {@link #bind(Map, Class)} with fields entered in the request's units.
     *
     * @param fieldUnits for each numeric field shown in a convertible unit, its quantity
     */
    public <T> T bind(Map<String, List<String>> form, Class<T> type, Units units, Map<String, Quantity> fieldUnits) {
        return binder.bind(toTree(form, type, units, fieldUnits), type);
    }

    /** The JSON tree for a record type built from form fields. */
    public ObjectNode toTree(Map<String, List<String>> form, Class<?> type, Units units, Map<String, Quantity> fieldUnits) {
        return tree.object(form, type, "", units, fieldUnits);
    }

    /** A record as flat dotted field values, e.g. to fill a form with defaults. */
    public static Map<String, String> flatten(Object record) {
        Map<String, String> out = new LinkedHashMap<>();
        flatten(Json.mapper().valueToTree(record), "", out);
        return out;
    }

    private static void flatten(JsonNode node, String path, Map<String, String> out) {
        if (node.isObject()) {
            node.fields().forEachRemaining(e -> flatten(e.getValue(), RecordBinder.join(path, e.getKey()), out));
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                flatten(node.get(i), path + "[" + i + "]", out);
            }
        } else if (!node.isNull()) {
            out.put(path, node.asText());
        }
    }

    /** Builds the tree by walking the record type, so each text is turned into the JSON type the field needs. */
    private static final class FormTree {
        private final JsonNodeFactory nodes = JsonNodeFactory.instance;

        ObjectNode object(Map<String, List<String>> form, Class<?> type, String prefix, Units units,
                          Map<String, Quantity> fieldUnits) {
            ObjectNode obj = nodes.objectNode();
            for (RecordComponent c : type.getRecordComponents()) {
                String path = RecordBinder.join(prefix, c.getName());
                JsonNode value = value(form, c.getGenericType(), path, units, fieldUnits);
                if (value != null) {
                    obj.set(c.getName(), value);
                }
            }
            return obj;
        }

        private JsonNode value(Map<String, List<String>> form, Type type, String path, Units units,
                               Map<String, Quantity> fieldUnits) {
            Class<?> raw = raw(type);
            if (raw == Optional.class) {
                return value(form, arg(type), path, units, fieldUnits);
            }
            if (raw.isRecord()) {
                boolean any = form.keySet().stream().anyMatch(k -> k.startsWith(path + ".") || k.startsWith(path + "["));
                return any ? object(form, raw, path, units, fieldUnits) : null;
            }
            if (raw == List.class) {
                return list(form, arg(type), path, units, fieldUnits);
            }
            List<String> texts = form.get(path);
            String text = texts == null || texts.isEmpty() ? null : texts.get(0).trim();
            if (raw == boolean.class || raw == Boolean.class) {
                return nodes.booleanNode(text != null && (text.equals("on") || text.equals("true")));
            }
            if (text == null || text.isEmpty()) {
                return null;
            }
            return FormText.toNode(text, raw, units, fieldUnits.get(path));
        }

        private JsonNode list(Map<String, List<String>> form, Type element, String path, Units units,
                              Map<String, Quantity> fieldUnits) {
            ArrayNode array = nodes.arrayNode();
            if (raw(element).isRecord()) {
                for (int i = 0; form.keySet().stream().anyMatch(k -> k.startsWith(path + "[" + array.size() + "].")); i++) {
                    array.add(object(form, raw(element), path + "[" + i + "]", units, fieldUnits));
                }
            } else {
                for (String text : form.getOrDefault(path, List.of())) {
                    if (!text.isBlank()) {
                        array.add(FormText.toNode(text.trim(), raw(element), units, fieldUnits.get(path)));
                    }
                }
            }
            return array.isEmpty() && !form.containsKey(path) ? null : array;
        }

        private static Class<?> raw(Type t) {
            return t instanceof ParameterizedType p ? (Class<?>) p.getRawType() : t instanceof Class<?> c ? c : Object.class;
        }

        private static Type arg(Type t) {
            return t instanceof ParameterizedType p ? p.getActualTypeArguments()[0] : Object.class;
        }
    }

    /** Single-valued fields in the shape a posted form has. */
    public static Map<String, List<String>> single(Map<String, String> values) {
        Map<String, List<String>> form = new HashMap<>();
        values.forEach((k, v) -> form.put(k, List.of(v)));
        return form;
    }
}
