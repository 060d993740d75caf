package coilwright.store;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.*;

class DatabaseTest {
    @TempDir
    Path dataDir;

    @Test
    void opening_creates_the_h2_file_in_the_data_directory_at_the_latest_schema_version() throws Exception {
        try (Database db = Database.open(DatabaseSettings.h2File(dataDir))) {
            assertEquals("3", db.schemaVersion());
            assertTrue(db.isReachable(2));
            assertFalse(db.isPostgres());
            try (Connection c = db.dataSource().getConnection();
                 ResultSet rs = c.createStatement().executeQuery(
                         "SELECT SETTING_VALUE FROM INFORMATION_SCHEMA.SETTINGS WHERE SETTING_NAME = 'WRITE_DELAY'")) {
                assertTrue(rs.next());
                assertEquals("0", rs.getString(1), "commits are written before they are acknowledged");
            }
        }
        assertTrue(Files.exists(dataDir.resolve("coilwright.mv.db")));
        try (Database again = Database.open(DatabaseSettings.h2File(dataDir))) {
            assertEquals("3", again.schemaVersion(), "reopening applies nothing twice");
        }
    }

    @Test
    void an_unreachable_database_is_reported_with_its_url_and_without_the_password() {
        DatabaseSettings s = new DatabaseSettings("jdbc:postgresql://127.0.0.1:1/none?password=hunter2",
                Optional.empty(), Optional.empty(), Optional.empty());
        StoreException e = assertThrows(StoreException.class, () -> Database.open(s));
        assertTrue(e.getMessage().contains("127.0.0.1:1/none"), e.getMessage());
        assertFalse(e.getMessage().contains("hunter2"), e.getMessage());
        assertFalse(e.getMessage().contains("\n") || e.getMessage().contains("\r"), "one line: " + e.getMessage());
        assertTrue(e.getMessage().contains("refused"), "the driver's own reason is kept: " + e.getMessage());
    }

    @Test
    void connections_go_back_to_the_pool_in_auto_commit_mode_after_a_transaction() throws Exception {
        try (Database db = Database.open(DatabaseSettings.h2File(dataDir))) {
            DesignStore store = new DesignStore(db);
            for (int i = 0; i < 30; i++) {
                store.create(new DraftRevision("t" + i, "", "{}", "{}", "test", 1));
            }
            List<Connection> all = new ArrayList<>();
            try {
                for (int i = 0; i < 10; i++) {
                    all.add(db.dataSource().getConnection());
                }
                for (Connection c : all) {
                    assertTrue(c.getAutoCommit(), "a pooled connection left in a transaction");
                }
            } finally {
                for (Connection c : all) {
                    c.close();
                }
            }
        }
    }
}
