package coilwright;

import coilwright.service.ExampleFiles;
import coilwright.service.Services;
import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.web.AppConfig;
import coilwright.web.ErrorMapping;
import coilwright.web.HealthHandler;
import coilwright.web.JacksonJsonMapper;
import coilwright.web.Json;
import coilwright.web.Metrics;
import coilwright.web.OpenApiHandler;
import coilwright.web.Route;
import coilwright.web.Units;
import coilwright.web.pages.DesignPages;
import coilwright.web.match.MatchRoutes;
import coilwright.web.api.ApiV1;
import coilwright.web.pages.HomePage;
import coilwright.web.pages.ThymeleafRenderer;
import coilwright.web.rewind.RewindRoutes;
import coilwright.web.saved.SavedDesigns;
import io.javalin.Javalin;
import io.javalin.http.staticfiles.Location;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
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
    private final Database database;
    private final Services services;
    private final ExecutorService demoLoader = Executors.newSingleThreadExecutor(r -> new Thread(r, "coilwright-demos"));

    private App(AppConfig config, List<Route> extraRoutes) {
        this.config = config;
        // open and migrate the database while this thread loads the JSON, metrics and template machinery:
        // the two overlap on a multi-core machine and start-up is shorter
        java.util.concurrent.CompletableFuture<Database> opening = java.util.concurrent.CompletableFuture.supplyAsync(
                () -> Database.open(DatabaseSettings.resolve(config.dataDir(), Optional.of(config.dbUrl()),
                        Optional.ofNullable(System.getenv("COILWRIGHT_DB_USER")),
                        Optional.ofNullable(System.getenv("COILWRIGHT_DB_PASSWORD")))));
        Json.mapper();
        Metrics metrics = new Metrics();
        ThymeleafRenderer renderer = new ThymeleafRenderer();
        this.database = joinOpening(opening);
        this.services = Services.create(database, Json.mapper());
        AtomicBoolean started = new AtomicBoolean(false);
        BooleanSupplier ready = started::get;
        List<Route> table = new ArrayList<>(routeTable(ready, metrics, services));
        table.addAll(extraRoutes);
        this.routes = List.copyOf(table);
        this.javalin = Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.http.maxRequestSize = config.maxBodyBytes();
            cfg.http.prefer405over404 = true;
            cfg.jsonMapper(new JacksonJsonMapper(Json.mapper()));
            cfg.fileRenderer(renderer);
            cfg.staticFiles.add(s -> {
                s.hostedPath = "/static";
                s.directory = "/static";
                s.location = Location.CLASSPATH;
            });
            cfg.requestLogger.http(metrics::record);
            cfg.routes.before(Units::remember);
            ErrorMapping.register(cfg.routes);
            routes.forEach(r -> cfg.routes.addHttpHandler(r.method(), r.path(), r.handler()));
            cfg.events.serverStarted(() -> started.set(true));
            cfg.events.serverStopping(() -> started.set(false));
        });
    }

    private static Database joinOpening(java.util.concurrent.CompletableFuture<Database> opening) {
        try {
            return opening.join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw e;
        }
    }

    /** Every route of the service. Handlers are thin and live in {@code coilwright.web}. */
    private static List<Route> routeTable(BooleanSupplier ready, Metrics metrics, Services services) {
        List<Route> r = new ArrayList<>(List.of(
                Route.get("/health", new HealthHandler(ready, services.designs()::isStoreReachable)),
                Route.get("/metrics", metrics),
                Route.get("/api/v1/openapi.json", new OpenApiHandler()),
                Route.get("/", new HomePage())));
        r.addAll(SavedDesigns.routes(services));
        r.addAll(DesignPages.routes(services));
        r.addAll(MatchRoutes.routes(services));
        r.addAll(RewindRoutes.routes(services));
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
        try {
            javalin.start(host, port);
        } catch (RuntimeException e) {
            database.close();
            throw e;
        }
        demoLoader.execute(this::loadDemos);
        demoLoader.shutdown();
        return this;
    }

    /** Stores the example designs as demos (idempotent; unchanged examples cost no evaluation). */
    private void loadDemos() {
        List<String> slugs = services.designs().loadDemos(ExampleFiles.read(App.class.getClassLoader()));
        LOG.info("demo designs ready: {}", slugs);
    }

    public App start() {
        return start("0.0.0.0", config.port());
    }

    public int port() {
        return javalin.port();
    }

    /** Stops listening, waits for the demo loader, and closes the database. */
    public void stop() {
        javalin.stop();
        demoLoader.shutdown();
        try {
            if (!demoLoader.awaitTermination(60, TimeUnit.SECONDS)) {
                LOG.warn("the demo loader is still running; closing the database anyway");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        database.close();
    }

    public Services services() {
        return services;
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
        App app;
        try {
            app = create(config).start();
        } catch (coilwright.store.StoreException | coilwright.validation.InvalidInputException e) {
            System.err.println("coilwright: " + e.getMessage());
            System.exit(1);
            return;
        } catch (io.javalin.util.JavalinBindException e) {
            System.err.println("coilwright: port " + config.port() + " is in use; choose another with --port or COILWRIGHT_PORT");
            System.exit(1);
            return;
        }
        LOG.info("Coilwright listening on http://localhost:{}/ (data in {})", app.port(), config.dataDir().toAbsolutePath());
        Runtime.getRuntime().addShutdownHook(new Thread(app::stop, "coilwright-stop"));
    }
}
