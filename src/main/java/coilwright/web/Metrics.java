package coilwright.web;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import io.javalin.router.Endpoint;
import io.micrometer.core.instrument.Timer;
import io.micrometer.core.instrument.binder.jvm.JvmMemoryMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmThreadMetrics;
import io.micrometer.core.instrument.binder.system.ProcessorMetrics;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.time.Duration;

/**
 * Prometheus metrics: request count and latency per (method, route template, status) as the timer
 * {@code http_server_requests_seconds}, plus JVM memory, threads and CPU. Also the {@code GET /metrics} handler.
 */
public final class Metrics implements Handler {
    private final PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);

    public Metrics() {
        new JvmMemoryMetrics().bindTo(registry);
        new JvmThreadMetrics().bindTo(registry);
        new ProcessorMetrics().bindTo(registry);
    }

    public PrometheusMeterRegistry registry() {
        return registry;
    }

    /** Javalin request logger: records one finished request. */
    public void record(Context ctx, Float elapsedMs) {
        Timer.builder("http.server.requests")
                .description("HTTP requests by route template")
                .tag("method", ctx.method().name())
                .tag("route", routeOf(ctx))
                .tag("status", Integer.toString(ctx.statusCode()))
                .publishPercentileHistogram()
                .maximumExpectedValue(Duration.ofSeconds(10))
                .register(registry)
                .record(Duration.ofNanos((long) (elapsedMs * 1_000_000L)));
    }

    private static String routeOf(Context ctx) {
        if (ctx.path().startsWith("/static/")) {
            return "/static/*";
        }
        Endpoint matched = ctx.endpoints().matchedHttpEndpoint();
        return matched == null ? "unmatched" : matched.path;
    }

    @Override
    public void handle(Context ctx) {
        ctx.contentType("text/plain; version=0.0.4; charset=utf-8").result(registry.scrape());
    }
}
