package coilwright.web;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.Map;

/**
 * {@code GET /api/v1/openapi.json}: the OpenAPI 3.1 document. The base is {@code openapi/openapi.json}; each feature
 * keeps its own paths and schemas in a part file listed in {@code openapi/parts.txt}, merged in at start-up.
 */
public final class OpenApiHandler implements Handler {
    public static final String RESOURCE = "openapi/openapi.json";
    public static final String PARTS = "openapi/parts.txt";
    private final byte[] document;

    public OpenApiHandler() {
        this.document = load();
    }

    /** The merged document's bytes. */
    public static byte[] load() {
        ObjectMapper mapper = new ObjectMapper();
        try {
            ObjectNode doc = (ObjectNode) mapper.readTree(read(RESOURCE));
            byte[] index = readOptional(PARTS);
            if (index != null) {
                for (String line : new String(index, StandardCharsets.UTF_8).split("\\R")) {
                    String name = line.strip();
                    if (!name.isEmpty() && !name.startsWith("#")) {
                        merge(doc, mapper.readTree(read("openapi/" + name)), name);
                    }
                }
            }
            return mapper.writerWithDefaultPrettyPrinter().writeValueAsBytes(doc);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void merge(ObjectNode doc, JsonNode part, String name) {
        mergeObject(doc.with("paths"), part.path("paths"), name);
        mergeObject(doc.with("components").with("schemas"), part.path("components").path("schemas"), name);
    }

    private static void mergeObject(ObjectNode into, JsonNode from, String name) {
        for (Iterator<Map.Entry<String, JsonNode>> it = from.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            if (into.has(e.getKey())) {
                throw new IllegalStateException("OpenAPI part " + name + " repeats " + e.getKey());
            }
            into.set(e.getKey(), e.getValue());
        }
    }

    private static byte[] read(String resource) throws IOException {
        byte[] bytes = readOptional(resource);
        if (bytes == null) {
            throw new IllegalStateException("missing classpath resource " + resource);
        }
        return bytes;
    }

    private static byte[] readOptional(String resource) throws IOException {
        try (InputStream in = OpenApiHandler.class.getClassLoader().getResourceAsStream(resource)) {
            return in == null ? null : in.readAllBytes();
        }
    }

    @Override
    public void handle(Context ctx) {
        ctx.contentType("application/json").result(document);
    }
}
