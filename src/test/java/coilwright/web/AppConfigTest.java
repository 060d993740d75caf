package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

class AppConfigTest {
    @Test
    void defaults_are_port_7070_data_dir_and_embedded_database() {
        AppConfig c = AppConfig.from(Map.of());
        assertEquals(7070, c.port());
        assertEquals(Path.of("data"), c.dataDir());
        assertEquals("", c.dbUrl());
        assertEquals(1024 * 1024, c.maxBodyBytes());
    }

    @Test
    void environment_variables_set_every_value() {
        AppConfig c = AppConfig.from(Map.of("COILWRIGHT_PORT", "8081", "COILWRIGHT_DATA_DIR", "/tmp/x",
                "COILWRIGHT_DB_URL", "jdbc:postgresql://127.0.0.1/test", "COILWRIGHT_MAX_BODY_BYTES", "2048"));
        assertEquals(new AppConfig(8081, Path.of("/tmp/x"), "jdbc:postgresql://127.0.0.1/test", 2048).withWarmUp(true), c);
    }

    @Test
    void options_win_over_environment_in_both_spellings() {
        AppConfig c = AppConfig.from(Map.of("COILWRIGHT_PORT", "8081"), "--port", "9090", "--data-dir=/srv/cw", "--db-url", "jdbc:h2:mem:x");
        assertEquals(9090, c.port());
        assertEquals(Path.of("/srv/cw"), c.dataDir());
        assertEquals("jdbc:h2:mem:x", c.dbUrl());
    }

    @Test
    void refuses_unknown_options_missing_values_and_bad_ports_naming_them() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AppConfig.from(Map.of(), "--prot", "1"))
                .getMessage().contains("unknown option --prot"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AppConfig.from(Map.of(), "--port"))
                .getMessage().contains("--port needs a value"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AppConfig.from(Map.of(), "--port", "70000"))
                .getMessage().contains("port = 70000"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AppConfig.from(Map.of("COILWRIGHT_PORT", "web")))
                .getMessage().contains("port = web: must be a whole number"));
    }

    @Test
    void the_service_warms_up_unless_told_not_to_and_settings_built_in_code_do_not() {
        assertTrue(AppConfig.from(Map.of()).warmUp());
        assertEquals(false, AppConfig.from(Map.of("COILWRIGHT_WARM_UP", "false")).warmUp());
        assertEquals(false, AppConfig.from(Map.of(), "--warm-up=false").warmUp());
        assertEquals(false, AppConfig.defaults().warmUp());
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AppConfig.from(Map.of(), "--warm-up", "yes"))
                .getMessage().contains("warm-up = yes: must be true or false"));
    }
}
