package coilwright.store;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.SQLNonTransientConnectionException;
import java.sql.SQLTransientConnectionException;
import java.util.Set;

/**
 * Runs units of work in a transaction and retries those that failed for a transient reason: a duplicate key
 * written by a concurrent transaction (the retry then finds the other's row), a lock timeout, a deadlock or a
 * serialization failure. SQL states: 23505 unique violation, 40001 serialization failure or deadlock (H2,
 * PostgreSQL), 40P01 deadlock (PostgreSQL), HYT00 lock timeout and 90131 concurrent update (H2).
 *
 * <p>A failure to reach the database is reported as {@link StoreUnavailableException} and not retried here (the
 * caller answers at once that the store is unavailable): JDBC's connection exceptions, SQL state class 08
 * (connection exception), 57P01 to 57P03 (PostgreSQL shutting down or not yet accepting connections) and 53300
 * (too many connections).
 */
final class Transactions {
    private static final Set<String> TRANSIENT = Set.of("23505", "40001", "40P01", "HYT00", "90131");
    private static final Set<String> UNAVAILABLE = Set.of("57P01", "57P02", "57P03", "53300");
    /** Attempts of a transaction that meets a transient conflict; with the growing pauses about 2 s in all. */
    private static final int MAX_ATTEMPTS = 16;
    /** Longest pause between two attempts, ms. */
    private static final long MAX_PAUSE_MS = 200;

    @FunctionalInterface
    interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    private final DataSource dataSource;

    Transactions(DataSource dataSource) {
        this.dataSource = dataSource;
    }

    /** Runs {@code work} in one transaction; unchecked exceptions from it roll back and pass through. */
    <T> T inTransaction(String what, Work<T> work) {
        for (int attempt = 1; ; attempt++) {
            try {
                return once(work);
            } catch (SQLException e) {
                if (!isTransient(e)) {
                    throw failure(what, e);
                }
                if (attempt >= MAX_ATTEMPTS) {
                    // still conflicting after ~2 s (many writers on one design, or a cold start after a crash): the
                    // caller may try again, so this is "unavailable for now" (503 + Retry-After), not a server error
                    throw new StoreUnavailableException(what + " kept meeting concurrent writers: " + e.getMessage(), e);
                }
                pause(attempt);
            }
        }
    }

    /** Runs a read on an auto-commit connection. */
    <T> T read(String what, Work<T> work) {
        try (Connection c = dataSource.getConnection()) {
            return work.run(c);
        } catch (SQLException e) {
            throw failure(what, e);
        }
    }

    static StoreException failure(String what, SQLException e) {
        String message = what + " failed: " + e.getMessage();
        return isUnavailable(e) ? new StoreUnavailableException(message, e) : new StoreException(message, e);
    }

    static boolean isUnavailable(SQLException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLTransientConnectionException || t instanceof SQLNonTransientConnectionException) {
                return true;
            }
            if (t instanceof SQLException s && s.getSQLState() != null
                    && (s.getSQLState().startsWith("08") || UNAVAILABLE.contains(s.getSQLState()))) {
                return true;
            }
        }
        return false;
    }

    /**
     * One attempt. Auto-commit is not switched back here: the pool (HikariCP) restores it when the connection is
     * returned, and a connection that broke mid-transaction would only answer "connection closed", hiding the
     * failure that says why (a lost database must be told apart from other failures).
     */
    private <T> T once(Work<T> work) throws SQLException {
        try (Connection c = dataSource.getConnection()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(c);
                c.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                try {
                    c.rollback();
                } catch (SQLException suppressed) {
                    e.addSuppressed(suppressed);
                }
                throw e;
            }
        }
    }

    static boolean isTransient(SQLException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && s.getSQLState() != null && TRANSIENT.contains(s.getSQLState())) {
                return true;
            }
        }
        return false;
    }

    private static void pause(int attempt) {
        try {
            long ceiling = Math.min(MAX_PAUSE_MS, 1L << Math.min(attempt, 20)); // exponential back-off with jitter
            Thread.sleep(java.util.concurrent.ThreadLocalRandom.current().nextLong(1, ceiling + 2));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new StoreException("interrupted while retrying a transaction", e);
        }
    }
}
