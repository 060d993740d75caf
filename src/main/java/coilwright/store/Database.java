package coilwright.store;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Optional;

/**
 * An open connection pool (HikariCP) over a migrated schema (Flyway, {@code classpath:db/migration}).
 * The same plain-SQL migrations serve H2 and PostgreSQL. Close it to release the pool; for H2 this also
 * closes the database file.
 */
public final class Database implements AutoCloseable {
    private final DatabaseSettings settings;
    private final HikariDataSource dataSource;
    private final String schemaVersion;

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
            throw new StoreException("cannot open the design store at " + settings.describe() + ": " + e.getMessage(), e);
        }
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

    /** True when a connection answers within {@code timeoutSeconds} (for a readiness check such as /health). */
    public boolean isReachable(int timeoutSeconds) {
        try (Connection c = dataSource.getConnection()) {
            return c.isValid(timeoutSeconds);
        } catch (SQLException e) {
            return false;
        }
    }

    @Override
    public void close() {
        dataSource.close();
    }
}
