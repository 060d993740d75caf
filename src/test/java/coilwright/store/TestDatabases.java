package coilwright.store;

import org.junit.jupiter.api.Assumptions;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.security.SecureRandom;

/**
 * Databases for the store tests: an H2 file in a temporary directory, or a fresh schema {@code cw_test_<random>}
 * in the PostgreSQL database {@code test} at 127.0.0.1:5432 (override with COILWRIGHT_TEST_PG_URL). When
 * PostgreSQL cannot be reached the tests are skipped, unless the environment variable CI is {@code true}: then
 * they fail.
 */
public final class TestDatabases {
    static final String DEFAULT_PG_URL = "jdbc:postgresql://127.0.0.1:5432/test";
    private static final SecureRandom RANDOM = new SecureRandom();
    private static volatile String pgUser;

    private TestDatabases() {
    }

    static DatabaseSettings h2(Path dir) {
        return DatabaseSettings.h2File(dir);
    }

    public static String pgUrl() {
        String url = System.getenv("COILWRIGHT_TEST_PG_URL");
        return url == null || url.isBlank() ? DEFAULT_PG_URL : url;
    }

    /** A settings object naming a new, not yet created schema; skips or fails when PostgreSQL is unreachable. */
    static DatabaseSettings freshPostgresSchema() {
        String user = postgresUser();
        String schema = "cw_test_" + HexFormat.of().formatHex(randomBytes(6));
        return new DatabaseSettings(pgUrl(), Optional.of(user), Optional.empty(), Optional.of(schema));
    }

    static void dropSchema(DatabaseSettings settings) throws SQLException {
        if (!settings.isPostgres() || settings.schema().isEmpty()) {
            return;
        }
        try (Connection c = DriverManager.getConnection(pgUrl(), settings.user().orElse(null), null);
             Statement s = c.createStatement()) {
            s.execute("DROP SCHEMA IF EXISTS " + settings.schema().get() + " CASCADE");
        }
    }

    /** The first of {@code postgres} and the OS user that the server lets in; skips or fails if none. */
    public static synchronized String postgresUser() {
        if (pgUser != null) {
            return pgUser;
        }
        List<String> problems = new ArrayList<>();
        DriverManager.setLoginTimeout(3);
        for (String user : List.of("postgres", System.getProperty("user.name"))) {
            try (Connection c = DriverManager.getConnection(pgUrl(), user, null)) {
                if (c.isValid(3)) {
                    pgUser = user;
                    return user;
                }
            } catch (SQLException e) {
                problems.add(user + ": " + e.getMessage());
            }
        }
        String message = "PostgreSQL at " + pgUrl() + " is not reachable with trust auth (" + String.join("; ", problems) + ")";
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new AssertionError(message + "; CI=true, so the PostgreSQL store tests fail instead of skipping");
        }
        Assumptions.abort(message + "; the PostgreSQL store tests are skipped (set CI=true to make this a failure)");
        return null;
    }

    private static byte[] randomBytes(int n) {
        byte[] b = new byte[n];
        RANDOM.nextBytes(b);
        return b;
    }
}
