package coilwright.store;

import org.junit.jupiter.api.Tag;

/**
 * The store contract on PostgreSQL, each test in a new schema {@code cw_test_<random>} that is dropped
 * afterwards. Skipped with a message when PostgreSQL is unreachable, failed instead when CI=true.
 */
@Tag("slow")
class PostgresDesignStoreTest extends DesignStoreContract {
    @Override
    protected DatabaseSettings newDatabase() {
        return TestDatabases.freshPostgresSchema();
    }

    @Override
    protected void dispose(DatabaseSettings settings) throws Exception {
        if (settings != null) {
            TestDatabases.dropSchema(settings);
        }
    }
}
