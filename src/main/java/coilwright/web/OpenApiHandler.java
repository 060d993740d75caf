package coilwright.web;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/** {@code GET /api/v1/openapi.json}: the OpenAPI 3.1 document kept in {@code openapi/openapi.json}. */
public final class OpenApiHandler implements Handler {
    public static final String RESOURCE = "openapi/openapi.json";
    private final byte[] document;

    public OpenApiHandler() {
        this.document = load();
    }

    /** The document's bytes from the classpath. */
    public static byte[] load() {
        try (InputStream in = OpenApiHandler.class.getClassLoader().getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing classpath resource " + RESOURCE);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void handle(Context ctx) {
        ctx.contentType("application/json").result(document);
    }
}
