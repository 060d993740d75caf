package coilwright.store;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Where the saved designs live: a JDBC URL, optional credentials and, for PostgreSQL, an optional schema.
 *
 * <p>The default is an H2 file database {@code coilwright.mv.db} in the data directory. Any H2 URL is given
 * {@code WRITE_DELAY=0} (unless it already names a write delay) so that a commit is written to the file before
 * it is acknowledged: with H2's default delay of 500 ms a process killed with SIGKILL loses commits it had
 * already acknowledged (see {@code CrashDurabilityTest}).
 *
 * @param jdbcUrl  a {@code jdbc:h2:} or {@code jdbc:postgresql:} URL
 * @param user     database user, or empty to let the URL or driver decide
 * @param password database password, or empty
 * @param schema   schema to create (if missing) and use, or empty for the connection's default schema
 */
public record DatabaseSettings(String jdbcUrl, Optional<String> user, Optional<String> password, Optional<String> schema) {
    private static final Pattern SCHEMA = Pattern.compile("[a-z_][a-z0-9_]{0,62}");
    /** Extra H2 settings: commits reach the file before acknowledgement; wait up to 10 s for a row lock. */
    static final String H2_OPTIONS = ";WRITE_DELAY=0;LOCK_TIMEOUT=10000";

    public DatabaseSettings {
        Objects.requireNonNull(jdbcUrl, "jdbcUrl");
        user = user == null ? Optional.empty() : user;
        password = password == null ? Optional.empty() : password;
        schema = schema == null ? Optional.empty() : schema;
        if (!jdbcUrl.startsWith("jdbc:h2:") && !jdbcUrl.startsWith("jdbc:postgresql:")) {
            throw new InvalidInputException(new FieldError("dbUrl", jdbcUrl,
                    "dbUrl = " + jdbcUrl + ": must start with jdbc:h2: or jdbc:postgresql:", "jdbc:h2:... or jdbc:postgresql:..."));
        }
        schema.ifPresent(s -> {
            if (!SCHEMA.matcher(s).matches()) {
                throw new InvalidInputException(new FieldError("dbSchema", s,
                        "dbSchema = " + s + ": must be a lower-case SQL name of 1 to 63 letters, digits or _",
                        "[a-z_][a-z0-9_]{0,62}"));
            }
        });
        if (jdbcUrl.startsWith("jdbc:h2:") && !jdbcUrl.toUpperCase(java.util.Locale.ROOT).contains("WRITE_DELAY")) {
            jdbcUrl = jdbcUrl + H2_OPTIONS;
        }
    }

    /** The default embedded store: an H2 file database {@code <dataDir>/coilwright.mv.db}. */
    public static DatabaseSettings h2File(Path dataDir) {
        String base = dataDir.toAbsolutePath().normalize().resolve("coilwright").toString().replace('\\', '/');
        return new DatabaseSettings("jdbc:h2:file:" + base, Optional.empty(), Optional.empty(), Optional.empty());
    }

    /**
     * The settings the app starts with: the given URL when it is present and not blank, else the H2 file in
     * {@code dataDir}.
     */
    public static DatabaseSettings resolve(Path dataDir, Optional<String> dbUrl, Optional<String> user,
                                           Optional<String> password) {
        Optional<String> url = dbUrl.map(String::trim).filter(s -> !s.isEmpty());
        if (url.isEmpty()) {
            return h2File(dataDir);
        }
        return new DatabaseSettings(url.get(), user, password, Optional.empty());
    }

    /** The same settings using (and creating if needed) the given schema. */
    public DatabaseSettings withSchema(String schemaName) {
        return new DatabaseSettings(jdbcUrl, user, password, Optional.of(schemaName));
    }

    public boolean isPostgres() {
        return jdbcUrl.startsWith("jdbc:postgresql:");
    }

    /** The URL with any password parameter masked, for logs. */
    public String describe() {
        return jdbcUrl.replaceAll("(?i)(password=)[^&;]*", "$1***") + schema.map(s -> " schema " + s).orElse("");
    }
}
