package coilwright.web.saved;

import coilwright.web.OpenApiHandler;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.dialect.Dialects;
import io.restassured.response.Response;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Checks real responses against the MERGED OpenAPI document (base plus part files), where the saved-design paths
 * and schemas live.
 */
final class SavedContract {
    private static final String URI = "https://coilwright.invalid/openapi.json";
    private static final SchemaRegistry SCHEMAS = SchemaRegistry.withDefaultDialect(Dialects.getOpenApi31(),
            b -> b.schemas(Map.of(URI, new String(OpenApiHandler.load(), StandardCharsets.UTF_8))));

    private SavedContract() {
    }

    static void assertMatches(Response r, String path, String method) {
        assertMatches(path, method, r.getStatusCode(), r.getContentType().split(";")[0].trim(), r.asString());
    }

    static void assertMatches(String path, String method, int status, String media, String body) {
        String pointer = "/paths/" + esc(path) + "/" + method.toLowerCase() + "/responses/" + status
                + "/content/" + esc(media) + "/schema";
        List<Error> errors = SCHEMAS.getSchema(SchemaLocation.of(URI + "#" + pointer)).validate(body, InputFormat.JSON);
        assertTrue(errors.isEmpty(), method + " " + path + " " + status + ": " + errors + "\n" + body);
    }

    private static String esc(String s) {
        return s.replace("~", "~0").replace("/", "~1");
    }
}
