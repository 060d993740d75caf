package coilwright.web;

import java.nio.file.Path;
import java.util.Map;

/**
 * Settings of one running service. Each comes from an environment variable or the matching
 * command-line option (the option wins): {@code COILWRIGHT_PORT}/{@code --port} (default 7070),
 * {@code COILWRIGHT_DATA_DIR}/{@code --data-dir} (default {@code ./data}), {@code COILWRIGHT_DB_URL}/
 * {@code --db-url} (default empty: an embedded database in the data directory) and
 * {@code COILWRIGHT_MAX_BODY_BYTES}/{@code --max-body-bytes} (default 1 MiB; larger bodies get 413),
 * {@code COILWRIGHT_MAX_BUSY}/{@code --max-busy} (calculations in flight at once, default the number of processors)
 * and {@code COILWRIGHT_BUSY_WAIT_MS}/{@code --busy-wait-ms} (how long a calculation may wait for its turn before it is
 * answered 503, default 1000 ms) and {@code COILWRIGHT_WARM_UP}/{@code --warm-up} ({@code true} or {@code false}, default
 * {@code true}: the model and the pages are exercised once in the background after the socket listens, so the first
 * request does not pay for the JIT's first run; settings built in code, as tests do, default to {@code false}).
 *
 * @param port            TCP port, 0 to 65535 (0 = any free port)
 * @param dataDir         directory for the embedded database and other files
 * @param dbUrl           JDBC URL of an external database, or empty for the embedded one
 * @param maxBodyBytes    largest accepted request body in bytes
 * @param maxBusy         expensive requests (evaluations, matches, rewinds, saves) computed at once, 1 to 1024
 * @param busyWaitMillis  longest wait of an expensive request for its turn, 0 to 60 000 ms
 * @param warmUp          exercise the model and the pages once after start
 */
public record AppConfig(int port, Path dataDir, String dbUrl, long maxBodyBytes, int maxBusy, long busyWaitMillis,
                        boolean warmUp) {
    public static final int DEFAULT_PORT = 7070;
    public static final long DEFAULT_MAX_BODY_BYTES = 1024 * 1024;
    public static final int DEFAULT_MAX_BUSY = Math.max(2, Runtime.getRuntime().availableProcessors());
    public static final long DEFAULT_BUSY_WAIT_MILLIS = 1000;

    public AppConfig {
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("port = " + port + ": must be between 0 and 65535");
        }
        if (maxBodyBytes < 1024) {
            throw new IllegalArgumentException("maxBodyBytes = " + maxBodyBytes + ": must be >= 1024");
        }
        if (maxBusy < 1 || maxBusy > 1024) {
            throw new IllegalArgumentException("maxBusy = " + maxBusy + ": must be between 1 and 1024");
        }
        if (busyWaitMillis < 0 || busyWaitMillis > 60_000) {
            throw new IllegalArgumentException("busyWaitMillis = " + busyWaitMillis + ": must be between 0 and 60000");
        }
        dataDir = dataDir == null ? Path.of("data") : dataDir;
        dbUrl = dbUrl == null ? "" : dbUrl;
    }

    /** With the default limits on expensive requests, no warm-up. */
    public AppConfig(int port, Path dataDir, String dbUrl, long maxBodyBytes) {
        this(port, dataDir, dbUrl, maxBodyBytes, DEFAULT_MAX_BUSY, DEFAULT_BUSY_WAIT_MILLIS, false);
    }

    /** The same settings with or without the warm-up after start. */
    public AppConfig withWarmUp(boolean newWarmUp) {
        return new AppConfig(port, dataDir, dbUrl, maxBodyBytes, maxBusy, busyWaitMillis, newWarmUp);
    }

    /** The same settings with another limit on expensive requests in flight and their wait. */
    public AppConfig withBusyLimit(int newMaxBusy, long newBusyWaitMillis) {
        return new AppConfig(port, dataDir, dbUrl, maxBodyBytes, newMaxBusy, newBusyWaitMillis, warmUp);
    }

    /** The defaults: port 7070, {@code ./data}, embedded database, 1 MiB bodies. */
    public static AppConfig defaults() {
        return new AppConfig(DEFAULT_PORT, Path.of("data"), "", DEFAULT_MAX_BODY_BYTES);
    }

    public AppConfig withPort(int newPort) {
        return new AppConfig(newPort, dataDir, dbUrl, maxBodyBytes, maxBusy, busyWaitMillis, warmUp);
    }

    public AppConfig withDataDir(Path dir) {
        return new AppConfig(port, dir, dbUrl, maxBodyBytes, maxBusy, busyWaitMillis, warmUp);
    }

    /**
     * Reads the environment, then the options ({@code --name value} or {@code --name=value}).
     *
     * @throws IllegalArgumentException for an unknown option, a missing value or a value that is not valid
     */
    public static AppConfig from(Map<String, String> env, String... args) {
        String port = env.getOrDefault("COILWRIGHT_PORT", Integer.toString(DEFAULT_PORT));
        String dataDir = env.getOrDefault("COILWRIGHT_DATA_DIR", "data");
        String dbUrl = env.getOrDefault("COILWRIGHT_DB_URL", "");
        String maxBody = env.getOrDefault("COILWRIGHT_MAX_BODY_BYTES", Long.toString(DEFAULT_MAX_BODY_BYTES));
        String maxBusy = env.getOrDefault("COILWRIGHT_MAX_BUSY", Integer.toString(DEFAULT_MAX_BUSY));
        String busyWait = env.getOrDefault("COILWRIGHT_BUSY_WAIT_MS", Long.toString(DEFAULT_BUSY_WAIT_MILLIS));
        String warmUp = env.getOrDefault("COILWRIGHT_WARM_UP", "true");
        for (int i = 0; i < args.length; i++) {
            String arg = args[i];
            String name = arg.contains("=") ? arg.substring(0, arg.indexOf('=')) : arg;
            String value;
            if (arg.contains("=")) {
                value = arg.substring(arg.indexOf('=') + 1);
            } else if (i + 1 < args.length) {
                value = args[++i];
            } else {
                throw new IllegalArgumentException(name + " needs a value");
            }
            switch (name) {
                case "--port" -> port = value;
                case "--data-dir" -> dataDir = value;
                case "--db-url" -> dbUrl = value;
                case "--max-body-bytes" -> maxBody = value;
                case "--max-busy" -> maxBusy = value;
                case "--busy-wait-ms" -> busyWait = value;
                case "--warm-up" -> warmUp = value;
                default -> throw new IllegalArgumentException("unknown option " + name
                        + " (known: --port, --data-dir, --db-url, --max-body-bytes, --max-busy, --busy-wait-ms, --warm-up)");
            }
        }
        long busy = longNumber("max-busy", maxBusy);
        return new AppConfig(number("port", port), Path.of(dataDir), dbUrl, longNumber("max-body-bytes", maxBody),
                busy == (int) busy ? (int) busy : -1, longNumber("busy-wait-ms", busyWait), bool("warm-up", warmUp));
    }

    private static boolean bool(String name, String text) {
        return switch (text.trim()) {
            case "true" -> true;
            case "false" -> false;
            default -> throw new IllegalArgumentException(name + " = " + text + ": must be true or false");
        };
    }

    private static int number(String name, String text) {
        long v = longNumber(name, text);
        if (v != (int) v) {
            throw new IllegalArgumentException(name + " = " + text + ": must be between 0 and 65535");
        }
        return (int) v;
    }

    private static long longNumber(String name, String text) {
        try {
            return Long.parseLong(text.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + " = " + text + ": must be a whole number");
        }
    }
}
