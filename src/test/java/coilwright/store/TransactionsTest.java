package coilwright.store;

import org.junit.jupiter.api.Test;

import java.sql.SQLException;
import java.sql.SQLNonTransientConnectionException;
import java.sql.SQLTransientConnectionException;

import static org.junit.jupiter.api.Assertions.*;

class TransactionsTest {
    @Test
    void duplicate_keys_lock_timeouts_and_deadlocks_are_retried_other_failures_are_not() {
        for (String state : new String[] {"23505", "40001", "40P01", "HYT00", "90131"}) {
            assertTrue(Transactions.isTransient(new SQLException("x", state)), state);
        }
        assertTrue(Transactions.isTransient(new SQLException("wrapped", "XX000", new SQLException("dup", "23505"))));
        for (String state : new String[] {"42P01", "22001", "08001", null}) {
            assertFalse(Transactions.isTransient(new SQLException("x", state)), String.valueOf(state));
        }
    }

    @Test
    void an_unreachable_database_is_told_apart_from_other_failures() {
        for (String state : new String[] {"08001", "08006", "08003", "57P01", "57P03", "53300"}) {
            assertInstanceOf(StoreUnavailableException.class, Transactions.failure("saving", new SQLException("x", state)), state);
        }
        assertInstanceOf(StoreUnavailableException.class, Transactions.failure("reading",
                new SQLTransientConnectionException("pool - Connection is not available, request timed out after 3000ms.")));
        assertInstanceOf(StoreUnavailableException.class, Transactions.failure("reading",
                new SQLException("wrapped", "XX000", new SQLNonTransientConnectionException("gone", "08006"))));
        for (String state : new String[] {"42P01", "22001", "23505", null}) {
            StoreException e = Transactions.failure("saving", new SQLException("x", state));
            assertFalse(e instanceof StoreUnavailableException, String.valueOf(state));
            assertEquals("saving failed: x", e.getMessage());
        }
    }

    @org.junit.jupiter.api.Test
    void a_conflict_that_outlasts_every_retry_is_unavailable_for_now_and_a_passing_one_commits() {
        org.h2.jdbcx.JdbcDataSource ds = new org.h2.jdbcx.JdbcDataSource();
        ds.setURL("jdbc:h2:mem:transactions-test;DB_CLOSE_DELAY=-1");
        Transactions tx = new Transactions(ds);
        java.util.concurrent.atomic.AtomicInteger attempts = new java.util.concurrent.atomic.AtomicInteger();
        assertThrows(StoreUnavailableException.class, () -> tx.inTransaction("revising", c -> {
            attempts.incrementAndGet();
            throw new SQLException("concurrent update", "40001");
        }));
        assertTrue(attempts.get() > 8, "retried patiently: " + attempts.get());
        java.util.concurrent.atomic.AtomicInteger second = new java.util.concurrent.atomic.AtomicInteger();
        int committedOnAttempt = tx.inTransaction("revising", c -> {
            if (second.incrementAndGet() < 3) {
                throw new SQLException("duplicate number", "23505");
            }
            return second.get();
        });
        assertEquals(3, committedOnAttempt);
    }
}
