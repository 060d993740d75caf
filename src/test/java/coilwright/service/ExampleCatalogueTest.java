package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.validation.InvalidInputException;
import coilwright.web.Json;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

public class ExampleCatalogueTest {
    static final List<String> SHIPPED = List.of("axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v");

    /** A class loader over a directory with {@code examples/} holding the shipped files plus {@code extra}. */
    public static URLClassLoader withExtraExample(Path dir, String extraSlug, String extraTitle) throws IOException {
        Path examples = Files.createDirectories(dir.resolve("examples"));
        for (String slug : SHIPPED) {
            try (OutputStream out = Files.newOutputStream(examples.resolve(slug + ".json"))) {
                copy(slug, out);
            }
        }
        String axial = new String(ExampleCatalogueTest.class.getClassLoader()
                .getResourceAsStream("examples/axial-wind-48v.json").readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        String extra = axial.replaceFirst("\"title\"\\s*:\\s*\"[^\"]*\"", "\"title\": \"" + extraTitle + "\"");
        Files.writeString(examples.resolve(extraSlug + ".json"), extra);
        return new URLClassLoader(new URL[] {dir.toUri().toURL()}, null);
    }

    private static void copy(String slug, OutputStream out) throws IOException {
        try (InputStream in = ExampleCatalogueTest.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            in.transferTo(out);
        }
    }

    @Test
    void reads_every_example_on_the_classpath_as_a_valid_design_document() {
        ExampleCatalogue catalogue = ExampleCatalogue.read(getClass().getClassLoader(), Json.mapper());
        assertEquals(SHIPPED, catalogue.slugs());
        catalogue.all().forEach(e -> assertTrue(!e.title().isBlank() && e.document().design() != null, e.slug()));
        assertEquals(SHIPPED, List.copyOf(catalogue.texts().keySet()), "the texts feed the demo designs");
    }

    @Test
    void a_file_added_to_the_folder_is_in_the_catalogue(@TempDir Path dir) throws IOException {
        try (URLClassLoader loader = withExtraExample(dir, "added-by-test", "An added example")) {
            ExampleCatalogue catalogue = ExampleCatalogue.read(loader, Json.mapper());
            assertEquals(4, catalogue.slugs().size());
            assertEquals("An added example", catalogue.find("added-by-test").orElseThrow().title());
        }
    }

    @Test
    void reads_the_examples_from_a_packaged_jar_too(@TempDir Path dir) throws IOException {
        Path jar = dir.resolve("examples.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            out.putNextEntry(new JarEntry("examples/"));
            out.closeEntry();
            for (String slug : SHIPPED) {
                out.putNextEntry(new JarEntry("examples/" + slug + ".json"));
                copy(slug, out);
                out.closeEntry();
            }
        }
        try (URLClassLoader loader = new URLClassLoader(new URL[] {jar.toUri().toURL()}, null)) {
            assertEquals(SHIPPED, ExampleCatalogue.read(loader, Json.mapper()).slugs());
        }
    }

    @Test
    void a_broken_example_stops_the_start_up_naming_the_file(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir.resolve("examples"));
        Files.writeString(dir.resolve("examples/broken.json"), "{\"schemaVersion\": 1, \"title\": \"\"}");
        try (URLClassLoader loader = new URLClassLoader(new URL[] {dir.toUri().toURL()}, null)) {
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> ExampleCatalogue.read(loader, Json.mapper()));
            assertTrue(e.getMessage().startsWith("example broken.json is not a valid design"), e.getMessage());
        }
    }

    @Test
    void a_form_naming_no_known_example_is_refused_with_the_known_ones() {
        ExampleCatalogue catalogue = ExampleCatalogue.read(getClass().getClassLoader(), Json.mapper());
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> catalogue.require("example", "nope"));
        assertEquals("example", e.errors().get(0).field());
        assertEquals("example = \"nope\": must name one of the example designs", e.errors().get(0).message());
        assertEquals(String.join(", ", SHIPPED), e.errors().get(0).allowed());
        assertEquals("axial-wind-48v", catalogue.require("example", "axial-wind-48v").slug());
    }
}
