package coilwright.web;

import coilwright.App;
import coilwright.service.ExampleCatalogue;
import io.restassured.RestAssured;
import io.restassured.config.JsonConfig;
import io.restassured.config.RestAssuredConfig;
import io.restassured.path.json.config.JsonPathConfig;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * The real app on 127.0.0.1 and a free port with a temporary data directory, RestAssured pointed at it (JSON
 * decimals read as Double). Use as <pre>{@code @RegisterExtension static final TestApp APP = new TestApp();}</pre>
 * Test classes share one server, started once per test run and stopped when the run ends; a class that needs test
 * routes ({@link #withRoutes}), another config ({@link #withConfig}) or other examples ({@link #withExamples}) gets a
 * server of its own for the class.
 */
public final class TestApp implements BeforeAllCallback, AfterAllCallback {
    private static final ExtensionContext.Namespace SHARED = ExtensionContext.Namespace.create(TestApp.class);

    private final List<Route> extraRoutes = new ArrayList<>();
    private UnaryOperator<AppConfig> configure = UnaryOperator.identity();
    private Optional<ExampleCatalogue> examples = Optional.empty();
    private boolean own;
    private Server server;

    public TestApp withRoutes(Route... routes) {
        extraRoutes.addAll(List.of(routes));
        own = true;
        return this;
    }

    public TestApp withConfig(UnaryOperator<AppConfig> change) {
        this.configure = change;
        own = true;
        return this;
    }

    public TestApp withExamples(ExampleCatalogue catalogue) {
        this.examples = Optional.of(catalogue);
        own = true;
        return this;
    }

    @Override
    public void beforeAll(ExtensionContext context) {
        server = own ? new Server(configure, extraRoutes, examples)
                : context.getRoot().getStore(SHARED).computeIfAbsent(Server.class,
                        k -> new Server(UnaryOperator.identity(), List.of(), Optional.empty()), Server.class);
        useRestAssured();
    }

    @Override
    public void afterAll(ExtensionContext context) {
        RestAssured.reset();
        if (own) {
            server.close();
        }
    }

    /** Points RestAssured at this app (call again if another TestApp ran in between). */
    public void useRestAssured() {
        RestAssured.baseURI = "http://127.0.0.1";
        RestAssured.port = server.app.port();
        RestAssured.config = RestAssuredConfig.config()
                .jsonConfig(JsonConfig.jsonConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE));
    }

    public App app() {
        return server.app;
    }

    public int port() {
        return server.app.port();
    }

    public Path dataDir() {
        return server.dataDir;
    }

    /** Absolute URL of a path on the running app, e.g. {@code url("/")}. */
    public String url(String path) {
        return "http://127.0.0.1:" + server.app.port() + path;
    }

    /** A running app and its data directory; closing stops it and deletes the directory. */
    private static final class Server implements AutoCloseable {
        final App app;
        final Path dataDir;

        Server(UnaryOperator<AppConfig> configure, List<Route> routes, Optional<ExampleCatalogue> examples) {
            try {
                dataDir = Files.createTempDirectory("coilwright-test-");
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            AppConfig config = configure.apply(AppConfig.defaults().withPort(0).withDataDir(dataDir));
            App created = examples.isPresent() ? App.create(config, routes, examples.get()) : App.create(config, routes);
            app = created.start("127.0.0.1", 0);
        }

        @Override
        public void close() {
            app.stop();
            try (Stream<Path> paths = Files.walk(dataDir)) {
                paths.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
