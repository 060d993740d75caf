package coilwright.web.api;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * Request bodies for the API tests, made from the example designs on the classpath and changed one field at a
 * time by dotted path ({@code alternator.winding.poles}). {@link #raw} puts any text, even invalid JSON such as a
 * bare {@code NaN}, in place of a value.
 */
final class Bodies {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final String RAW_MARK = "__raw__";
    private final ObjectNode root;
    private String rawValue;

    private Bodies(ObjectNode root) {
        this.root = root;
    }

    /** The {@code design} of {@code examples/<slug>.json}: an evaluate request. */
    static Bodies exampleDesign(String slug) {
        return new Bodies((ObjectNode) example(slug).get("design").deepCopy());
    }

    /** The whole {@code examples/<slug>.json} document. */
    static JsonNode example(String slug) {
        try (InputStream in = Bodies.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            return MAPPER.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A winding request with automatic pitch, one path and no skew. */
    static Bodies winding(int slots, int poles, int phases, String layers) {
        ObjectNode n = MAPPER.createObjectNode().put("slots", slots).put("poles", poles).put("phases", phases)
                .put("layers", layers).put("coilPitchSlots", 0).put("parallelPaths", 1).put("skewSlotPitches", 0.0);
        return new Bodies(n);
    }

    Bodies set(String path, Object value) {
        parent(path).set(leaf(path), MAPPER.valueToTree(value));
        return this;
    }

    Bodies remove(String path) {
        parent(path).remove(leaf(path));
        return this;
    }

    /** Puts {@code text} verbatim as the value at {@code path} (only one raw value per body). */
    Bodies raw(String path, String text) {
        rawValue = text;
        return set(path, RAW_MARK);
    }

    String json() {
        try {
            String json = MAPPER.writeValueAsString(root);
            return rawValue == null ? json : json.replace("\"" + RAW_MARK + "\"", rawValue);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private ObjectNode parent(String path) {
        ObjectNode node = root;
        String[] parts = path.split("\\.");
        for (int i = 0; i < parts.length - 1; i++) {
            node = (ObjectNode) node.get(parts[i]);
        }
        return node;
    }

    private static String leaf(String path) {
        return path.substring(path.lastIndexOf('.') + 1);
    }
}
