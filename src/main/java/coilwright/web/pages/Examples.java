package coilwright.web.pages;

import coilwright.service.DesignDocument;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.Json;
import coilwright.web.NotFoundException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/** The example designs shipped on the classpath as {@code examples/<slug>.json}, read once, in slug order. */
final class Examples {
    private static final String DIR = "examples";
    private static final List<Example> ALL = load();

    /** One example: its slug (file name without {@code .json}) and its design file. */
    public record Example(String slug, DesignDocument document) {
    }

    private Examples() {
    }

    static List<Example> all() {
        return ALL;
    }

    /** @throws NotFoundException naming the known slugs when there is no such example */
    static Example find(String slug) {
        return ALL.stream().filter(e -> e.slug().equals(slug)).findFirst().orElseThrow(() -> new NotFoundException(
                "No example design named \"" + slug + "\"; the examples are: "
                        + String.join(", ", ALL.stream().map(Example::slug).toList())));
    }

    /** @throws InvalidInputException when no example was named */
    static String requiredSlug(String slug) {
        if (slug == null || slug.isBlank()) {
            String names = String.join(", ", ALL.stream().map(Example::slug).toList());
            throw new InvalidInputException(new FieldError("example", "missing",
                    "example is missing: name one of the example designs", names));
        }
        return slug;
    }

    private static List<Example> load() {
        URL dir = Examples.class.getClassLoader().getResource(DIR);
        if (dir == null) {
            return List.of();
        }
        try {
            URI uri = dir.toURI();
            if ("jar".equals(uri.getScheme())) {
                try (FileSystem jar = openJar(uri)) {
                    return read(jar.getPath(DIR));
                }
            }
            return read(Path.of(uri));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot list " + dir, e);
        }
    }

    private static FileSystem openJar(URI uri) throws IOException {
        try {
            return FileSystems.newFileSystem(uri, Map.of());
        } catch (FileSystemAlreadyExistsException e) {
            throw new IllegalStateException("the jar file system is already open: " + uri, e);
        }
    }

    private static List<Example> read(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".json")).sorted()
                    .map(n -> new Example(n.substring(0, n.length() - 5), parse(DIR + "/" + n))).toList();
        }
    }

    private static DesignDocument parse(String resource) {
        try (InputStream in = Examples.class.getClassLoader().getResourceAsStream(resource)) {
            return Json.mapper().readValue(in, DesignDocument.class);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read example " + resource, e);
        }
    }
}
