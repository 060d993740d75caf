package coilwright.service;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

/** The example design files on the classpath ({@code examples/<slug>.json}), from a directory or a jar. */
public final class ExampleFiles {
    static final String FOLDER = "examples/";

    private ExampleFiles() {
    }

    /** Every {@code examples/*.json} as slug (file name without {@code .json}) to its UTF-8 text, sorted by slug. */
    public static Map<String, String> read(ClassLoader loader) {
        List<String> names = new ArrayList<>(list(loader));
        Collections.sort(names);
        Map<String, String> out = new LinkedHashMap<>();
        for (String name : names) {
            try (InputStream in = loader.getResourceAsStream(FOLDER + name)) {
                if (in != null) {
                    out.put(name.substring(0, name.length() - ".json".length()), new String(in.readAllBytes(), StandardCharsets.UTF_8));
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return out;
    }

    private static List<String> list(ClassLoader loader) {
        URL folder = loader.getResource(FOLDER);
        try {
            if (folder != null && folder.getProtocol().equals("file")) {
                try (Stream<Path> files = Files.list(Path.of(folder.toURI()))) {
                    return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".json")).toList();
                }
            }
            if (folder != null && folder.getProtocol().equals("jar")) {
                return inJar(((JarURLConnection) folder.openConnection()).getJarFile());
            }
            URL self = ExampleFiles.class.getProtectionDomain().getCodeSource().getLocation();
            if (self != null && self.getPath().endsWith(".jar")) {
                try (JarFile jar = new JarFile(Path.of(self.toURI()).toFile())) {
                    return inJar(jar);
                }
            }
            return List.of();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot list " + FOLDER + ": " + e.getMessage(), e);
        }
    }

    private static List<String> inJar(JarFile jar) {
        return jar.stream().map(JarEntry::getName)
                .filter(n -> n.startsWith(FOLDER) && n.endsWith(".json") && n.indexOf('/', FOLDER.length()) < 0)
                .map(n -> n.substring(FOLDER.length())).toList();
    }
}
