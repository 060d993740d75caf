package coilwright.web;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.util.Map;
import java.util.function.BooleanSupplier;

/**
 * {@code GET /health}: 503 {@code {"status":"starting"}} until the service is ready; then 200 with
 * {@code {"status":"up","database":"up"}}, or {@code {"status":"degraded","database":"down"}} while the database of
 * saved designs cannot be reached. Degraded is still 200 because everything else keeps working: a proxy that
 * dropped every instance sharing the lost database would stop the calculations too.
 */
public final class HealthHandler implements Handler {
    private final BooleanSupplier ready;
    private final BooleanSupplier databaseUp;

    public HealthHandler(BooleanSupplier ready, BooleanSupplier databaseUp) {
        this.ready = ready;
        this.databaseUp = databaseUp;
    }

    @Override
    public void handle(Context ctx) {
        if (!ready.getAsBoolean()) {
            ctx.status(503).json(Map.of("status", "starting"));
            return;
        }
        boolean database = databaseUp.getAsBoolean();
        ctx.status(200).json(Map.of("status", database ? "up" : "degraded", "database", database ? "up" : "down"));
    }
}
