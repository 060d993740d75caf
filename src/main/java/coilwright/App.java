package coilwright;

import coilwright.service.ExampleCatalogue;
import coilwright.service.Services;
import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.web.AppConfig;
import coilwright.web.ErrorMapping;
import coilwright.web.FormBinder;
import coilwright.web.HealthHandler;
import coilwright.web.JacksonJsonMapper;
import coilwright.web.LowLevelErrors;
import coilwright.web.RequestBodies;
import coilwright.web.SecurityHeaders;
import coilwright.web.WorkLimit;
import coilwright.web.Json;
import coilwright.web.Metrics;
import coilwright.web.OldNamesNotice;
import coilwright.web.OpenApiHandler;
import coilwright.web.RecordBinder;
import coilwright.web.Route;
import coilwright.web.api.EvaluationApi;
import coilwright.web.match.MatchApi;
import coilwright.web.match.MatchPages;
import coilwright.web.pages.DesignPage;
import coilwright.web.pages.RevisionForm;
import coilwright.web.pages.HomePage;
import coilwright.web.pages.ThymeleafRenderer;
import coilwright.web.pages.WarmUp;
import coilwright.web.pages.WindingPage;
import coilwright.web.rewind.RewindApi;
import coilwright.web.rewind.RewindPage;
import coilwright.web.saved.SavedDesignApi;
import coilwright.web.saved.SavedDesignPages;
import coilwright.web.sizing.SizingApi;
import coilwright.web.sizing.SizingPage;
import coilwright.web.units.Units;
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
 * Entry point and the only wiring point: reads the config, builds the services and the handlers, and starts the
 * web server. The whole HTTP surface is visible here: every route in one table ({@link #routeTable}: method, path,
 * handler), the filters and the error mapping. Feature packages under {@code coilwright.web} hold handlers only.
 */
public final class App {
    private static final Logger LOG = LoggerFactory.getLogger(App.class);

    private final Javalin javalin;
    private final AppConfig config;
    private final List<Route> routes;
    private final Database database;
    private final Services services;
    private final ThymeleafRenderer renderer = new ThymeleafRenderer();
    private final AtomicBoolean running = new AtomicBoolean(true);
    private final ExecutorService demoLoader = Executors.newSingleThreadExecutor(r -> new Thread(r, "coilwright-demos"));

    private App(AppConfig config, List<Route> extraRoutes, Optional<ExampleCatalogue> examples) {
        this.config = config;
        // open and migrate the database while this thread loads the JSON, metrics and template machinery:
        // the two overlap on a multi-core machine and start-up is shorter
        java.util.concurrent.CompletableFuture<Database> opening = java.util.concurrent.CompletableFuture.supplyAsync(
                () -> Database.open(DatabaseSettings.resolve(config.dataDir(), Optional.of(config.dbUrl()),
                        Optional.ofNullable(System.getenv("COILWRIGHT_DB_USER")),
                        Optional.ofNullable(System.getenv("COILWRIGHT_DB_PASSWORD")))));
        Json.mapper();
        Metrics metrics = new Metrics();
        this.database = joinOpening(opening);
        this.services = examples.map(e -> Services.create(database, Json.mapper(), e))
                .orElseGet(() -> Services.create(database, Json.mapper()));
        AtomicBoolean started = new AtomicBoolean(false);
        BooleanSupplier ready = started::get;
        WorkLimit work = new WorkLimit(config.maxBusy(), config.busyWaitMillis());
        List<Route> table = new ArrayList<>(routeTable(ready, metrics, services, work));
        table.addAll(extraRoutes);
        this.routes = List.copyOf(table);
        this.javalin = Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.http.maxRequestSize = config.maxBodyBytes();
            // multipart bodies are parsed by the container, not through maxRequestSize: the same limit for them
            cfg.jetty.multipartConfig.maxTotalRequestSize(config.maxBodyBytes(), io.javalin.config.SizeUnit.BYTES);
            cfg.jetty.multipartConfig.maxFileSize(config.maxBodyBytes(), io.javalin.config.SizeUnit.BYTES);
            cfg.jetty.modifyServer(server -> server.setErrorHandler(new LowLevelErrors()));
            cfg.http.prefer405over404 = true;
            // gzip for HTML, JSON, SVG and CSV answers over 1500 bytes, when the client accepts it
            cfg.http.compressionStrategy = io.javalin.compression.CompressionStrategy.GZIP;
            cfg.jsonMapper(new JacksonJsonMapper(Json.mapper()));
            cfg.fileRenderer(renderer);
            cfg.staticFiles.add(s -> {
                s.hostedPath = "/static";
                s.directory = "/static";
                s.location = Location.CLASSPATH;
            });
            cfg.requestLogger.http(metrics::record);
            cfg.routes.before(SecurityHeaders::apply);
            cfg.routes.before(RequestBodies::knownCharset);
            cfg.routes.before(Units::remember);
            cfg.routes.before("/api/*", OldNamesNotice::mark);
            ErrorMapping.register(cfg.routes, this::allowedMethods);
            routes.forEach(r -> cfg.routes.addHttpHandler(r.method(), r.path(),
                    RequestBodies.guard(r, config.maxBodyBytes())));
            cfg.events.serverStarted(() -> started.set(true));
            cfg.events.serverStopping(() -> started.set(false));
        });
    }

    /** The methods the routes on a path take (HEAD with GET), for the {@code Allow} of a 405. */
    private List<String> allowedMethods(String path) {
        List<String> methods = new ArrayList<>();
        routes.stream().filter(r -> r.matches(path)).map(r -> r.method().name()).distinct().forEach(methods::add);
        if (methods.contains("GET")) {
            methods.add("HEAD");
        }
        return methods;
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

    /**
     * Every route of the service: method, path and handler. Handlers are thin and live in {@code coilwright.web}.
     * Handlers that compute (evaluate, lay out, match, rewind, save or recompute a design) run under {@code work}, the
     * limit on expensive requests in flight.
     */
    private static List<Route> routeTable(BooleanSupplier ready, Metrics metrics, Services services, WorkLimit work) {
        RecordBinder binder = new RecordBinder(Json.mapper());
        EvaluationApi designApi = new EvaluationApi(services.evaluation(), services.examples(), binder, Json.mapper());
        MatchApi matchApi = new MatchApi(services.matching(), binder);
        RewindApi rewindApi = new RewindApi(services.rewind(), binder);
        SavedDesignApi savedApi = new SavedDesignApi(services.designs());
        SizingApi sizingApi = new SizingApi(services.sizing(), binder);
        SizingPage sizing = new SizingPage(services.sizing(), binder);
        HomePage home = new HomePage(services.examples());
        DesignPage design = new DesignPage(services.evaluation(), services.examples());
        WindingPage winding = new WindingPage(services.evaluation());
        MatchPages match = new MatchPages(services.matching(), services.examples(), binder);
        RewindPage rewind = new RewindPage(services.rewind(), new FormBinder(binder));
        SavedDesignPages saved = new SavedDesignPages(services.designs(), services.evaluation());
        RevisionForm revision = new RevisionForm(services.designs());
        return List.of(
                Route.get("/health", new HealthHandler(ready, services.designs()::isStoreReachable)),
                Route.get("/metrics", metrics),
                Route.get("/api/v1/openapi.json", new OpenApiHandler()),
                // JSON API: designs, windings, catalogues, examples
                Route.post("/api/v1/evaluate", work.guard(designApi::evaluate)),
                Route.post("/api/v1/winding", work.guard(designApi::winding)),
                Route.get("/api/v1/catalogue", designApi::catalogue),
                Route.get("/api/v1/examples", designApi::examples),
                Route.get("/api/v1/examples/{slug}", designApi::example),
                // JSON API: turbine matching and rewinding
                Route.post("/api/v1/match/wind", work.guard(matchApi::wind)),
                Route.post("/api/v1/match/hydro", work.guard(matchApi::hydro)),
                Route.post("/api/v1/rewind", work.guard(rewindApi::plan)),
                Route.post("/api/v1/rewind/stator-options", work.guard(rewindApi::statorOptions)),
                // JSON API: saved designs
                Route.post("/api/v1/designs", work.guard(savedApi::create)),
                Route.post("/api/v1/designs/import", work.guard(savedApi::importFile)).withUploads(),
                Route.post("/api/v1/designs/{designId}/revisions", work.guard(savedApi::revise)),
                Route.get("/api/v1/designs/{designId}", savedApi::design),
                Route.get("/api/v1/designs/{designId}/export", savedApi::exportDesign),
                Route.get("/api/v1/designs/{designId}/curves.csv", work.guard(savedApi::designCurves)),
                Route.get("/api/v1/revisions/{revisionId}", savedApi::revision),
                Route.get("/api/v1/revisions/{revisionId}/export", savedApi::exportRevision),
                Route.get("/api/v1/revisions/{revisionId}/curves.csv", work.guard(savedApi::revisionCurves)),
                Route.get("/api/v1/revisions/{revisionId}/recomputed", work.guard(savedApi::recomputed)),
                Route.get("/api/v1/compare", work.guard(savedApi::compare)),
                Route.get("/api/v1/demos", savedApi::demos),
                // JSON API: design from requirements
                Route.post("/api/v1/sizing", sizingApi::size),
                Route.get("/api/v1/sizing/jobs/{jobId}", sizingApi::job),
                Route.delete("/api/v1/sizing/jobs/{jobId}", sizingApi::cancel),
                Route.get("/api/v1/sizing/jobs/{jobId}/events", sizingApi::events),
                // pages: design, winding, matching, rewinding
                Route.get("/", home::show),
                Route.get("/design/new", design::newDesign),
                Route.post("/design", work.guard(design::submit)),
                Route.get("/design/results", work.guard(design::exampleResults)),
                Route.get("/design/bench", work.guard(design::bench)),
                Route.get("/winding", work.guard(winding::show)),
                Route.get(WindingPage.DRAWING, work.guard(winding::drawing)),
                Route.get("/match/wind", match::windForm),
                Route.post("/match/wind", work.guard(match::windResult)),
                Route.get("/match/hydro", match::hydroForm),
                Route.post("/match/hydro", work.guard(match::hydroResult)),
                Route.get("/rewind", rewind::show),
                Route.post("/rewind", work.guard(rewind::plan)),
                Route.post("/rewind/stator-options", work.guard(rewind::statorOptions)),
                Route.get("/sizing", sizing::show),
                Route.post("/sizing", sizing::size),
                Route.get("/sizing/jobs/{jobId}", sizing::job),
                Route.post("/sizing/jobs/{jobId}/cancel", sizing::cancel),
                // pages: saved designs
                Route.get("/saved/new", saved::newForm),
                Route.post("/saved", work.guard(saved::save)).withUploads(),
                Route.get("/d/{designId}", saved::latest),
                Route.get("/d/{designId}/r/{revisionId}", saved::revision),
                Route.get("/d/{designId}/r/{revisionId}/recomputed", work.guard(saved::recomputed)),
                Route.get("/d/{designId}/r/{revisionId}/print", saved::print),
                Route.get("/d/{designId}/revise", revision::show),
                Route.post("/d/{designId}/revise", work.guard(revision::revise)).withUploads(),
                Route.get("/compare", work.guard(saved::compare)),
                Route.get("/demos", saved::demos));
    }

    /** A startable app; nothing listens until {@link #start}. */
    public static App create(AppConfig config) {
        return new App(config, List.of(), Optional.empty());
    }

    /** As {@link #create(AppConfig)} plus routes of the caller's own (tests). */
    public static App create(AppConfig config, List<Route> extraRoutes) {
        return new App(config, extraRoutes, Optional.empty());
    }

    /** As {@link #create(AppConfig, List)} with the example designs of another catalogue (tests). */
    public static App create(AppConfig config, List<Route> extraRoutes, ExampleCatalogue examples) {
        return new App(config, extraRoutes, Optional.of(examples));
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
        if (config.warmUp()) {
            Thread warming = new Thread(this::warmUp, "coilwright-warm-up");
            warming.setDaemon(true);
            warming.setPriority(Thread.MIN_PRIORITY);
            warming.start();
        }
        return this;
    }

    /** The first requests' work done once in the background (see {@link WarmUp}); stops early when the app stops. */
    private void warmUp() {
        long t0 = System.nanoTime();
        int pages = WarmUp.run(services.evaluation(), services.examples(), renderer, running::get);
        LOG.info("warm-up: {} example evaluations and results pages in {} ms", pages, (System.nanoTime() - t0) / 1_000_000);
    }

    /** Stores the example designs as demos (idempotent; unchanged examples cost no evaluation). */
    private void loadDemos() {
        List<String> slugs = services.designs().loadDemos(services.examples().texts());
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
        running.set(false);
        javalin.stop();
        services.sizing().close();
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
