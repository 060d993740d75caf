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
}
