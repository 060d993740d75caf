package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.dialect.Dialects;
import io.restassured.response.Response;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * The OpenAPI 3.1 document ({@code openapi/openapi.json} on the classpath) as a test oracle: which
 * operations it documents, and whether a real response body matches the schema it documents for
 * (path, method, status, media type). Any test may call {@link #assertMatches(Response, String, String)}.
 */
public final class OpenApiContract {
    /** The IRI the merged document is known by to the validator (never fetched: it is given as text). */
    private static final String RESOURCE = "https://coilwright.invalid/openapi.json";
    private static final String MERGED = new String(OpenApiHandler.load(), java.nio.charset.StandardCharsets.UTF_8);
    private static final JsonNode DOC = new ObjectMapper().readTree(MERGED);
    /** Schemas are resolved in the merged document (base plus every part file), as served. */
    private static final SchemaRegistry SCHEMAS = SchemaRegistry.withDefaultDialect(Dialects.getOpenApi31(),
            b -> b.schemas(Map.of(RESOURCE, MERGED)));
    private static final Map<String, Schema> CACHE = new ConcurrentHashMap<>();

    private OpenApiContract() {
    }

    /** Every documented operation as "GET /path". */
    public static Set<String> documentedOperations() {
        Set<String> ops = new TreeSet<>();
        for (Map.Entry<String, JsonNode> path : DOC.get("paths").properties()) {
            for (String method : path.getValue().propertyNames()) {
                if (List.of("get", "post", "put", "patch", "delete", "head", "options").contains(method)) {
                    ops.add(method.toUpperCase(Locale.ROOT) + " " + path.getKey());
                }
            }
        }
        return ops;
    }

    /** Validates a RestAssured response: its status and media type pick the documented schema. */
    public static void assertMatches(Response response, String path, String method) {
        String mediaType = response.getContentType().split(";")[0].trim();
        assertMatches(path, method, response.getStatusCode(), mediaType, response.asString());
    }

    /**
     * @param path the documented path template, e.g. {@code /api/v1/designs/{id}}
     * @throws AssertionError when the response is undocumented or does not match its schema
     */
    public static void assertMatches(String path, String method, int status, String mediaType, String body) {
        String pointer = responsePointer(path, method.toLowerCase(Locale.ROOT), status) + "/content/"
                + escape(mediaType) + "/schema";
        if (DOC.at(pointer).isMissingNode()) {
            fail("undocumented response: " + method + " " + path + " " + status + " " + mediaType + " (no " + pointer + ")");
        }
        List<Error> errors = CACHE.computeIfAbsent(pointer, p -> SCHEMAS.getSchema(SchemaLocation.of(RESOURCE + "#" + p)))
                .validate(body, InputFormat.JSON);
        assertTrue(errors.isEmpty(), method + " " + path + " " + status + " does not match its schema: " + errors
                + "\nbody: " + body);
    }

    /** Validates a JSON body against a named schema in components/schemas. */
    public static void assertMatchesComponent(String schemaName, String body) {
        String pointer = "/components/schemas/" + escape(schemaName);
        List<Error> errors = CACHE.computeIfAbsent(pointer, p -> SCHEMAS.getSchema(SchemaLocation.of(RESOURCE + "#" + p)))
                .validate(body, InputFormat.JSON);
        assertTrue(errors.isEmpty(), schemaName + " mismatch: " + errors + "\nbody: " + body);
    }

    /** The pointer to a documented response, following one {@code $ref} into components/responses. */
    private static String responsePointer(String path, String method, int status) {
        String pointer = "/paths/" + escape(path) + "/" + method + "/responses/" + status;
        JsonNode response = DOC.at(pointer);
        if (response.has("$ref")) {
            return response.get("$ref").asString().substring(1);
        }
        return pointer;
    }

    private static String escape(String token) {
        return token.replace("~", "~0").replace("/", "~1");
    }
}
