package coilwright.web.match;

import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.dialect.Dialects;
import io.restassured.response.Response;
import coilwright.web.OpenApiHandler;

import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Validates match responses against the merged OpenAPI document (base plus part files), where the match schemas live.
 * main's OpenApiContract resolves schemas in the base file only; once it validates against the merged document
 * (as on the api branch) this helper can give way to {@code OpenApiContract.assertMatches}.
 */
final class MatchContract {
    private static final String RESOURCE = "https://coilwright.invalid/openapi.json";
    private static final String MERGED = new String(OpenApiHandler.load(), java.nio.charset.StandardCharsets.UTF_8);
    private static final SchemaRegistry SCHEMAS = SchemaRegistry.withDefaultDialect(Dialects.getOpenApi31(),
            b -> b.schemas(Map.of(RESOURCE, MERGED)));

    private MatchContract() {
    }

    static void assertMatches(Response response, String path, String method) {
        String media = response.getContentType().split(";")[0].trim();
        String pointer = "/paths/" + escape(path) + "/" + method.toLowerCase(java.util.Locale.ROOT) + "/responses/"
                + response.getStatusCode() + "/content/" + escape(media) + "/schema";
        List<Error> errors = SCHEMAS.getSchema(SchemaLocation.of(RESOURCE + "#" + pointer))
                .validate(response.asString(), InputFormat.JSON);
        assertTrue(errors.isEmpty(), method + " " + path + " " + response.getStatusCode() + ": " + errors
                + "\nbody: " + response.asString().substring(0, Math.min(2000, response.asString().length())));
    }

    private static String escape(String token) {
        return token.replace("~", "~0").replace("/", "~1");
    }
}
