package coilwright;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.*;

/** The calculation core knows no web, JSON, database or template library (DESIGN.md section 2). */
class CoreImportsTest {
    static final List<String> CORE = List.of("winding", "magnet", "conductor", "machine", "load", "turbine",
            "system", "rewind", "search", "sizing", "safety", "validation");
    static final Pattern FORBIDDEN = Pattern.compile(
            "^\\s*import\\s+(static\\s+)?(io\\.javalin|com\\.fasterxml|tools\\.jackson|java\\.sql|javax\\.sql|org\\.thymeleaf"
                    + "|coilwright\\.web|coilwright\\.store|coilwright\\.service|org\\.h2|org\\.postgresql|com\\.zaxxer|org\\.flywaydb)\\b.*");

    @Test
    void core_packages_import_no_web_json_database_or_template_library() throws IOException {
        Path root = Path.of("src/main/java/coilwright");
        assertTrue(Files.isDirectory(root), "run from the project root");
        List<String> offences = new ArrayList<>();
        for (String pkg : CORE) {
            Path dir = root.resolve(pkg);
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    List<String> lines = Files.readAllLines(f);
                    for (int i = 0; i < lines.size(); i++) {
                        if (FORBIDDEN.matcher(lines.get(i)).matches()) {
                            offences.add(f + ":" + (i + 1) + ": " + lines.get(i).trim());
                        }
                    }
                }
            }
        }
        assertEquals(List.of(), offences);
    }

    @Test
    void the_scan_recognises_a_forbidden_import() {
        assertTrue(FORBIDDEN.matcher("import io.javalin.Javalin;").matches());
        assertTrue(FORBIDDEN.matcher("import java.sql.Connection;").matches());
        assertFalse(FORBIDDEN.matcher("import org.apache.commons.math3.util.FastMath;").matches());
    }
}
