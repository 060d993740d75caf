package coilwright.store;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * An open connection pool (HikariCP) over a migrated schema (Flyway, {@code classpath:db/migration}).
 * The same plain-SQL migrations serve H2 and PostgreSQL. Close it to release the pool; for H2 this also
 * closes the database file.
 */
public final class Database implements AutoCloseable {
    /** How long a request waits for a pooled connection before the store is reported unavailable, in ms. */
    static final long CONNECTION_TIMEOUT_MS = 3_000;
    private static final long VALIDATION_TIMEOUT_MS = 1_000;
    private static final long PROBE_REUSE_NANOS = 1_000_000_000L;
    private final DatabaseSettings settings;
    private final HikariDataSource dataSource;
    private final String schemaVersion;
    private final AtomicBoolean probing = new AtomicBoolean();
    private volatile boolean lastProbeAnswered = true;
    private volatile long lastProbeNanos = System.nanoTime() - PROBE_REUSE_NANOS;

    private Database(DatabaseSettings settings, HikariDataSource dataSource, String schemaVersion) {
        this.settings = settings;
        this.dataSource = dataSource;
        this.schemaVersion = schemaVersion;
    }

    /**
     * Opens the pool and migrates the schema to the latest version.
     *
     * @throws StoreException when the database cannot be reached or migrated (message names the URL, password masked)
     */
    public static Database open(DatabaseSettings settings) {
        return open(settings, Optional.empty());
    }

    /** Opens the pool and migrates up to {@code targetVersion} only (for migration tests). */
    static Database open(DatabaseSettings settings, Optional<String> targetVersion) {
        try {
            return openUnchecked(settings, targetVersion);
        } catch (StoreException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new StoreException("cannot open the design store at " + settings.describe() + ": " + reason(e), e);
        }
    }

    /**
     * The innermost cause's message, on one line and with any password masked: the driver's own words
     * ("Connection to 127.0.0.1:1 refused") say more than the layers that wrap them, and a start-up failure
     * is reported as a single line.
     */
    static String reason(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        String text = root.getMessage() == null ? root.getClass().getSimpleName() : root.getMessage();
        return text.replaceAll("(?i)(password=)[^&;\\s]*", "$1***").replaceAll("\\s*\\R\\s*", " ").strip();
    }

    private static Database openUnchecked(DatabaseSettings settings, Optional<String> targetVersion) {
        String version = migrate(settings, targetVersion);
        HikariConfig config = new HikariConfig();
        config.setJdbcUrl(settings.jdbcUrl());
        settings.user().ifPresent(config::setUsername);
        settings.password().ifPresent(config::setPassword);
        settings.schema().ifPresent(config::setSchema);
        config.setPoolName("coilwright-store");
        config.setMaximumPoolSize(10);
        config.setAutoCommit(true);
        config.setTransactionIsolation("TRANSACTION_READ_COMMITTED");
        // when the database is away, a request waits at most this long for a connection and then answers 503;
        // the pool keeps trying in the background and serves again as soon as the database answers
        config.setConnectionTimeout(CONNECTION_TIMEOUT_MS);
        config.setValidationTimeout(VALIDATION_TIMEOUT_MS);
        if (settings.isPostgres()) {
            // seconds; a URL parameter of the same name wins. Without a socket timeout a connection whose
            // server vanished without a reset would hold its request until the operating system gives up.
            config.addDataSourceProperty("connectTimeout", "5");
            config.addDataSourceProperty("socketTimeout", "30");
            config.addDataSourceProperty("tcpKeepAlive", "true");
        }
        return new Database(settings, new HikariDataSource(config), version);
    }

    /** Creates the schema if asked for and applies the migrations; returns the version reached. */
    private static String migrate(DatabaseSettings settings, Optional<String> targetVersion) {
        var configuration = Flyway.configure(Database.class.getClassLoader())
                .dataSource(settings.jdbcUrl(), settings.user().orElse(null), settings.password().orElse(null))
                .locations("classpath:db/migration");
        settings.schema().ifPresent(s -> configuration.schemas(s).defaultSchema(s).createSchemas(true));
        targetVersion.ifPresent(configuration::target);
        // the migrate result names the version reached; asking flyway.info() would scan the database a second time
        var result = configuration.load().migrate();
        String reached = result.targetSchemaVersion != null ? result.targetSchemaVersion : result.initialSchemaVersion;
        return reached == null ? "" : reached;
    }

    public DataSource dataSource() {
        return dataSource;
    }

    public DatabaseSettings settings() {
        return settings;
    }

    public boolean isPostgres() {
        return settings.isPostgres();
    }

    /** The Flyway schema version in force after opening, e.g. {@code "2"}. */
    public String schemaVersion() {
        return schemaVersion;
    }

    /**
     * True when a connection answers within {@code timeoutSeconds} (for a readiness check such as /health). At
     * most one probe runs at a time and a result is reused for a second, so frequent checks cost the database
     * nothing and, while it is away, do not queue up behind the pool's connection timeout.
     */
    public boolean isReachable(int timeoutSeconds) {
        long now = System.nanoTime();
        if (now - lastProbeNanos < PROBE_REUSE_NANOS || !probing.compareAndSet(false, true)) {
            return lastProbeAnswered;
        }
        try (Connection c = dataSource.getConnection()) {
            lastProbeAnswered = c.isValid(timeoutSeconds);
        } catch (SQLException e) {
            lastProbeAnswered = false;
        } finally {
            lastProbeNanos = System.nanoTime();
            probing.set(false);
        }
        return lastProbeAnswered;
    }

    @Override
    public void close() {
        dataSource.close();
    }
}
