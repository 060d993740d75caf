package coilwright;

import coilwright.service.Services;
import coilwright.web.AppConfig;
import coilwright.web.ErrorMapping;
import coilwright.web.HealthHandler;
import coilwright.web.JacksonJsonMapper;
import coilwright.web.Json;
import coilwright.web.Metrics;
import coilwright.web.OpenApiHandler;
import coilwright.web.Route;
import coilwright.web.Units;
import coilwright.web.api.ApiV1;
import coilwright.web.pages.HomePage;
import coilwright.web.pages.ThymeleafRenderer;
import io.javalin.Javalin;
import io.javalin.http.staticfiles.Location;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Entry point: reads the config, wires the service and starts the web server. The whole HTTP surface
 * is visible here: the route table ({@link #routeTable}), the filters and the error mapping.
 */
public final class App {
    private static final Logger LOG = LoggerFactory.getLogger(App.class);

    private final Javalin javalin;
    private final AppConfig config;
    private final List<Route> routes;

    private App(AppConfig config, List<Route> extraRoutes) {
        this.config = config;
        AtomicBoolean ready = new AtomicBoolean(false);
        Metrics metrics = new Metrics();
        Services services = Services.create();
        List<Route> table = new ArrayList<>(routeTable(ready, metrics, services));
        table.addAll(extraRoutes);
        this.routes = List.copyOf(table);
        this.javalin = Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.http.maxRequestSize = config.maxBodyBytes();
            cfg.http.prefer405over404 = true;
            cfg.jsonMapper(new JacksonJsonMapper(Json.mapper()));
            cfg.fileRenderer(new ThymeleafRenderer());
            cfg.staticFiles.add(s -> {
                s.hostedPath = "/static";
                s.directory = "/static";
                s.location = Location.CLASSPATH;
            });
            cfg.requestLogger.http(metrics::record);
            cfg.routes.before(Units::remember);
            ErrorMapping.register(cfg.routes);
            routes.forEach(r -> cfg.routes.addHttpHandler(r.method(), r.path(), r.handler()));
            cfg.events.serverStarted(() -> ready.set(true));
            cfg.events.serverStopping(() -> ready.set(false));
        });
    }

    /** Every route of the service. Handlers are thin and live in {@code coilwright.web}. */
    private static List<Route> routeTable(AtomicBoolean ready, Metrics metrics, Services services) {
        List<Route> r = new ArrayList<>(List.of(
                Route.get("/health", new HealthHandler(ready::get)),
                Route.get("/metrics", metrics),
                Route.get("/api/v1/openapi.json", new OpenApiHandler()),
                Route.get("/", new HomePage())));
        r.addAll(ApiV1.routes(services));
        return r;
    }

    /** A startable app; nothing listens until {@link #start}. */
    public static App create(AppConfig config) {
        return new App(config, List.of());
    }

    /** As {@link #create(AppConfig)} plus routes of the caller's own (tests). */
    public static App create(AppConfig config, List<Route> extraRoutes) {
        return new App(config, extraRoutes);
    }

    /** Starts listening; port 0 picks a free port (see {@link #port()}). */
    public App start(String host, int port) {
        javalin.start(host, port);
        return this;
    }

    public App start() {
        return start("0.0.0.0", config.port());
    }

    public int port() {
        return javalin.port();
    }

    public void stop() {
        javalin.stop();
    }

    public AppConfig config() {
        return config;
    }

    /** The registered route table, in registration order. */
    public List<Route> routes() {
        return routes;
    }

    public static void main(String[] args) {
        AppConfig config;
        try {
            config = AppConfig.from(System.getenv(), args);
        } catch (IllegalArgumentException e) {
            System.err.println("coilwright: " + e.getMessage());
            System.exit(2);
            return;
        }
        App app = create(config).start();
        LOG.info("Coilwright listening on http://localhost:{}/ (data in {})", app.port(), config.dataDir().toAbsolutePath());
        Runtime.getRuntime().addShutdownHook(new Thread(app::stop, "coilwright-stop"));
    }
}
