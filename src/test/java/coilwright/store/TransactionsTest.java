package coilwright.store;

import org.junit.jupiter.api.Test;

import java.sql.SQLException;

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
}
