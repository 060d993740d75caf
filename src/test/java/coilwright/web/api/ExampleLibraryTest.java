package coilwright.web.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.service.DesignDocument;
import coilwright.web.Json;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExampleLibraryTest {
    private static final RecordBinder BINDER = new RecordBinder(Json.mapper());

    @Test
    void reads_every_example_on_the_classpath_as_a_valid_design_document() {
        ExampleLibrary library = ExampleLibrary.fromClasspath(BINDER);
        assertEquals(List.of("axial-wind-24v", "radial-hydro-48v", "rewound-motor-12v"), library.slugs());
        DesignDocument axial = library.get("axial-wind-24v");
        assertEquals(12, axial.design().alternator().winding().slots());
        assertEquals(48, axial.design().alternator().turnsPerCoil());
    }

    @Test
    void an_unknown_slug_is_not_found() {
        NotFoundException e = assertThrows(NotFoundException.class,
                () -> ExampleLibrary.fromClasspath(BINDER).get("missing"));
        assertTrue(e.getMessage().startsWith("There is no example named 'missing'."), e.getMessage());
    }

    @Test
    void summaries_link_to_each_document() {
        ExampleSummary first = ExampleLibrary.fromClasspath(BINDER).summaries().get(0);
        assertEquals("/api/v1/examples/axial-wind-24v", first.href());
        assertTrue(first.title().startsWith("Axial-flux"), first.title());
    }

    @Test
    void reads_the_examples_from_a_packaged_jar_too(@TempDir Path dir) throws IOException {
        Path jar = dir.resolve("app.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            out.putNextEntry(new JarEntry("examples/"));
            out.closeEntry();
            out.putNextEntry(new JarEntry("examples/only-one.json"));
            copyExample("axial-wind-24v", out);
            out.closeEntry();
            out.putNextEntry(new JarEntry("examples/readme.txt"));
            out.write("not an example".getBytes(StandardCharsets.UTF_8));
            out.closeEntry();
        }
        try (URLClassLoader loader = new URLClassLoader(new URL[] {jar.toUri().toURL()}, null)) {
            ExampleLibrary library = ExampleLibrary.fromClassLoader(loader, BINDER);
            assertEquals(List.of("only-one"), library.slugs());
            assertEquals(16, library.get("only-one").design().alternator().winding().poles());
        }
    }

    @Test
    void a_broken_example_stops_the_start_up_naming_the_file(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir.resolve("examples"));
        Files.writeString(dir.resolve("examples/broken.json"), "{\"schemaVersion\": 1, \"title\": \"x\", \"notes\": \"\"}");
        try (URLClassLoader loader = new URLClassLoader(new URL[] {dir.toUri().toURL()}, null)) {
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> ExampleLibrary.fromClassLoader(loader, BINDER));
            assertTrue(e.getMessage().startsWith("example broken.json is not a valid design: design is missing"),
                    e.getMessage());
        }
    }

    private static void copyExample(String slug, OutputStream out) throws IOException {
        try (InputStream in = ExampleLibraryTest.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            in.transferTo(out);
        }
    }
}
