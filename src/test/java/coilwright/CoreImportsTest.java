package coilwright;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The calculation core knows no web, JSON, database or template library (DESIGN.md section 2): neither by an
 * import nor by a fully qualified name anywhere in its code (comments may name them).
 */
class CoreImportsTest {
    /** The core packages; one that does not exist yet is skipped. */
    static final List<String> CORE = List.of("validation", "winding", "magnet", "conductor", "machine", "load", "turbine",
            "system", "rewind", "sizing", "search", "safety", "thermal", "losses", "cogging", "demag");
    static final Pattern FORBIDDEN = Pattern.compile(
            "\\b(io\\.javalin|com\\.fasterxml|tools\\.jackson|java\\.sql|javax\\.sql|org\\.thymeleaf"
                    + "|coilwright\\.web|coilwright\\.store|coilwright\\.service|org\\.h2|org\\.postgresql|com\\.zaxxer"
                    + "|org\\.flywaydb)\\.");

    @Test
    void core_packages_name_no_web_json_database_or_template_library() throws IOException {
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
                    offences.addAll(offences(f.toString(), Files.readString(f)));
                }
            }
        }
        assertEquals(List.of(), offences);
    }

    /** Each forbidden name in the code of one source file, as {@code file:line: name}. */
    static List<String> offences(String file, String source) {
        String code = withoutComments(source);
        List<String> out = new ArrayList<>();
        Matcher m = FORBIDDEN.matcher(code);
        while (m.find()) {
            int line = 1 + (int) code.substring(0, m.start()).chars().filter(c -> c == '\n').count();
            out.add(file + ":" + line + ": " + m.group(1));
        }
        return out;
    }

    /** The source with every comment blanked out (line breaks kept, so line numbers stay); string literals stay. */
    static String withoutComments(String s) {
        StringBuilder out = new StringBuilder(s.length());
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == '/' && i + 1 < s.length() && s.charAt(i + 1) == '/') {
                while (i < s.length() && s.charAt(i) != '\n') {
                    i++;
                }
            } else if (c == '/' && i + 1 < s.length() && s.charAt(i + 1) == '*') {
                int end = s.indexOf("*/", i + 2);
                end = end < 0 ? s.length() : end + 2;
                s.substring(i, end).chars().filter(ch -> ch == '\n').forEach(ch -> out.append('\n'));
                i = end;
            } else if (c == '"' || c == '\'') {
                int end = i + 1;
                while (end < s.length() && s.charAt(end) != c) {
                    end += s.charAt(end) == '\\' ? 2 : 1;
                }
                end = Math.min(end + 1, s.length());
                out.append(s, i, end);
                i = end;
            } else {
                out.append(c);
                i++;
            }
        }
        return out.toString();
    }

    @Test
    void the_scan_finds_an_import_and_a_fully_qualified_name_in_code() {
        assertEquals(List.of("F:1: io.javalin"), offences("F", "import io.javalin.Javalin;"));
        assertEquals(List.of("F:2: java.sql"), offences("F", "class A {\n  java.sql.Connection c;\n}"));
        assertEquals(List.of("F:1: coilwright.web"), offences("F", "Object o = new coilwright.web.Json();"));
        assertEquals(List.of("F:1: com.fasterxml"), offences("F", "@com.fasterxml.jackson.annotation.JsonIgnore int x;"));
    }

    @Test
    void the_scan_ignores_comments_and_allowed_libraries() {
        assertEquals(List.of(), offences("F", "import org.apache.commons.math3.util.FastMath;"));
        assertEquals(List.of(), offences("F", "// like io.javalin.Javalin does\nint x; /* not java.sql.Connection */"));
        assertEquals(List.of(), offences("F", "/** See {@link coilwright.service.Services}. */\nclass A {}"));
        assertEquals(List.of(), offences("F", "String url = \"http://example.org\"; // coilwright.web.Json"));
    }
}
