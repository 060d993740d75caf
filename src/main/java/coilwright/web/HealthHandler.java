package coilwright.web;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.util.Map;
import java.util.function.BooleanSupplier;

/** {@code GET /health}: 200 {@code {"status":"up"}} once the service is ready, 503 "starting" before. */
public final class HealthHandler implements Handler {
    private final BooleanSupplier ready;

    public HealthHandler(BooleanSupplier ready) {
        this.ready = ready;
    }

    @Override
    public void handle(Context ctx) {
        boolean up = ready.getAsBoolean();
        ctx.status(up ? 200 : 503).json(Map.of("status", up ? "up" : "starting"));
    }
}
