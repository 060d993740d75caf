package coilwright.web.api;

import coilwright.service.DesignDocument;
import coilwright.service.ExampleFiles;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The invented example designs, {@code examples/<slug>.json} on the classpath (a directory in development, a jar
 * folder when packaged), read and validated once at start-up. A broken example stops the start-up: it is a build
 * fault, not a user's.
 */
public final class ExampleLibrary {
    private final Map<String, DesignDocument> bySlug;

    ExampleLibrary(Map<String, DesignDocument> bySlug) {
        this.bySlug = Collections.unmodifiableMap(new TreeMap<>(bySlug));
    }

    /** Reads every {@code examples/*.json} on the classpath with the API's binder (same validation as a request). */
    public static ExampleLibrary fromClasspath(RecordBinder binder) {
        return fromClassLoader(ExampleLibrary.class.getClassLoader(), binder);
    }

    /** As {@link #fromClasspath} from a given class loader's {@code examples/} folder (a directory or in a jar). */
    static ExampleLibrary fromClassLoader(ClassLoader loader, RecordBinder binder) {
        Map<String, DesignDocument> docs = new TreeMap<>();
        ExampleFiles.read(loader).forEach((slug, json) -> docs.put(slug, bind(binder, slug + ".json", json)));
        return new ExampleLibrary(docs);
    }

    private static DesignDocument bind(RecordBinder binder, String name, String json) {
        try {
            return binder.bind(json, DesignDocument.class);
        } catch (RuntimeException e) {
            throw new IllegalStateException("example " + name + " is not a valid design: " + e.getMessage(), e);
        }
    }

    /** The example slugs, sorted. */
    public List<String> slugs() {
        return List.copyOf(bySlug.keySet());
    }

    /**
     * @throws NotFoundException when no example has that slug
     */
    public DesignDocument get(String slug) {
        DesignDocument doc = bySlug.get(slug);
        if (doc == null) {
            throw new NotFoundException("There is no example named '" + slug + "'. The examples are: "
                    + String.join(", ", bySlug.keySet()) + ".");
        }
        return doc;
    }

    /** One summary per example, sorted by slug. */
    public List<ExampleSummary> summaries() {
        return bySlug.entrySet().stream()
                .map(e -> new ExampleSummary(e.getKey(), e.getValue().title(), e.getValue().notes(),
                        ApiV1.PREFIX + "/examples/" + e.getKey()))
                .toList();
    }
}
