package coilwright.web;

import coilwright.App;
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
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Starts the real app on 127.0.0.1 and a free port with a fresh temporary data directory, points
 * RestAssured at it (JSON decimals read as Double), and stops it after the test class. Use as
 * <pre>{@code @RegisterExtension static final TestApp APP = new TestApp();}</pre>
 * optionally with {@link #withRoutes} (test-only routes) or {@link #withConfig}.
 */
public final class TestApp implements BeforeAllCallback, AfterAllCallback {
    private final List<Route> extraRoutes = new ArrayList<>();
    private UnaryOperator<AppConfig> configure = UnaryOperator.identity();
    private App app;
    private Path dataDir;

    public TestApp withRoutes(Route... routes) {
        extraRoutes.addAll(List.of(routes));
        return this;
    }

    public TestApp withConfig(UnaryOperator<AppConfig> change) {
        this.configure = change;
        return this;
    }

    @Override
    public void beforeAll(ExtensionContext context) throws IOException {
        dataDir = Files.createTempDirectory("coilwright-test-");
        AppConfig config = configure.apply(AppConfig.defaults().withPort(0).withDataDir(dataDir));
        app = App.create(config, extraRoutes).start("127.0.0.1", 0);
        useRestAssured();
    }

    /** Points RestAssured at this app (call again if another TestApp ran in between). */
    public void useRestAssured() {
        RestAssured.baseURI = "http://127.0.0.1";
        RestAssured.port = app.port();
        RestAssured.config = RestAssuredConfig.config()
                .jsonConfig(JsonConfig.jsonConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE));
    }

    @Override
    public void afterAll(ExtensionContext context) {
        app.stop();
        RestAssured.reset();
        deleteTree(dataDir);
    }

    public App app() {
        return app;
    }

    public int port() {
        return app.port();
    }

    public Path dataDir() {
        return dataDir;
    }

    /** Absolute URL of a path on the running app, e.g. {@code url("/")}. */
    public String url(String path) {
        return "http://127.0.0.1:" + app.port() + path;
    }

    private static void deleteTree(Path root) {
        try (Stream<Path> paths = Files.walk(root)) {
            paths.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
