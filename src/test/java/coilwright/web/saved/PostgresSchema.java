package coilwright.web.saved;

import coilwright.store.TestDatabases;

import java.security.SecureRandom;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.HexFormat;

/**
 * A schema of its own in the test PostgreSQL database, created on construction and dropped on close, with the URL
 * the app is started with ({@code currentSchema} names it). Skips the test when PostgreSQL is unreachable, fails it
 * instead under CI=true (see {@link TestDatabases#postgresUser()}).
 */
final class PostgresSchema implements AutoCloseable {
    private static final SecureRandom RANDOM = new SecureRandom();
    final String user;
    final String name;

    PostgresSchema(String prefix) throws SQLException {
        this.user = TestDatabases.postgresUser();
        byte[] random = new byte[6];
        RANDOM.nextBytes(random);
        this.name = prefix + HexFormat.of().formatHex(random);
        sql("CREATE SCHEMA " + name);
    }

    /** The app's database URL for this schema, reaching PostgreSQL at {@code hostPort} (e.g. through a proxy). */
    String appUrl(String hostPort) {
        return TestDatabases.pgUrl().replace("127.0.0.1:5432", hostPort) + "?user=" + user + "&currentSchema=" + name;
    }

    String appUrl() {
        return appUrl("127.0.0.1:5432");
    }

    void sql(String statement) throws SQLException {
        try (Connection c = DriverManager.getConnection(TestDatabases.pgUrl(), user, null);
             Statement s = c.createStatement()) {
            s.execute(statement);
        }
    }

    int count(String query) throws SQLException {
        try (Connection c = DriverManager.getConnection(TestDatabases.pgUrl(), user, null);
             Statement s = c.createStatement(); var rs = s.executeQuery(query)) {
            rs.next();
            return rs.getInt(1);
        }
    }

    @Override
    public void close() throws SQLException {
        sql("DROP SCHEMA IF EXISTS " + name + " CASCADE");
    }
}
