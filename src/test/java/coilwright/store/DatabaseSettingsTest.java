package coilwright.store;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.*;

class DatabaseSettingsTest {
    @Test
    void the_default_is_an_h2_file_in_the_data_directory_written_on_every_commit() {
        DatabaseSettings s = DatabaseSettings.resolve(Path.of("/srv/cw-data"), Optional.empty(), Optional.empty(), Optional.empty());
        assertEquals("jdbc:h2:file:/srv/cw-data/coilwright;WRITE_DELAY=0;LOCK_TIMEOUT=10000", s.jdbcUrl());
        assertFalse(s.isPostgres());
        assertEquals(s, DatabaseSettings.resolve(Path.of("/srv/cw-data"), Optional.of("  "), Optional.empty(), Optional.empty()));
    }

    @Test
    void a_postgresql_url_is_used_as_given() {
        DatabaseSettings s = DatabaseSettings.resolve(Path.of("x"), Optional.of("jdbc:postgresql://db:5432/cw"),
                Optional.of("cw"), Optional.empty());
        assertEquals("jdbc:postgresql://db:5432/cw", s.jdbcUrl());
        assertTrue(s.isPostgres());
        assertEquals(Optional.of("cw"), s.user());
        assertEquals("cw_test_1", s.withSchema("cw_test_1").schema().orElseThrow());
    }

    @Test
    void an_explicit_h2_write_delay_is_left_alone() {
        assertEquals("jdbc:h2:file:/d/x;WRITE_DELAY=100", new DatabaseSettings("jdbc:h2:file:/d/x;WRITE_DELAY=100",
                Optional.empty(), Optional.empty(), Optional.empty()).jdbcUrl());
    }

    @Test
    void other_databases_and_unsafe_schema_names_are_refused() {
        assertThrows(InvalidInputException.class, () -> new DatabaseSettings("jdbc:mysql://h/db",
                Optional.empty(), Optional.empty(), Optional.empty()));
        assertThrows(InvalidInputException.class, () -> new DatabaseSettings("jdbc:postgresql://h/db",
                Optional.empty(), Optional.empty(), Optional.of("x; DROP SCHEMA public")));
    }

    @Test
    void describe_hides_a_password_in_the_url() {
        DatabaseSettings s = new DatabaseSettings("jdbc:postgresql://h/db?user=u&password=secret&ssl=true",
                Optional.empty(), Optional.empty(), Optional.empty());
        assertEquals("jdbc:postgresql://h/db?user=u&password=***&ssl=true", s.describe());
    }
}
