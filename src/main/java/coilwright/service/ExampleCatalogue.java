package coilwright.service;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The invented example designs, {@code examples/<slug>.json} (a classpath directory in development, a folder of the
 * jar when packaged), read and validated once at start-up and shared by every page and route: a file added to
 * {@code examples/} appears on the home page, the design and match forms, the API and the demos. A broken example
 * stops the start-up, naming its file: it is a fault of the build, not of a user.
 */
public final class ExampleCatalogue {
    /** One example: its slug (the file name without {@code .json}), its design file and the file's text. */
    public record Example(String slug, DesignDocument document, String text) {
        public String title() {
            return document.title();
        }
    }

    private final Map<String, Example> bySlug;

    private ExampleCatalogue(Map<String, Example> bySlug) {
        this.bySlug = Collections.unmodifiableMap(new TreeMap<>(bySlug));
    }

    /** Every {@code examples/*.json} the class loader sees, read with the service's strict mapper. */
    public static ExampleCatalogue read(ClassLoader loader, ObjectMapper mapper) {
        Map<String, Example> examples = new TreeMap<>();
        ExampleFiles.read(loader).forEach((slug, text) -> examples.put(slug, new Example(slug, parse(mapper, slug, text), text)));
        return new ExampleCatalogue(examples);
    }

    private static DesignDocument parse(ObjectMapper mapper, String slug, String text) {
        try {
            return mapper.readValue(text, DesignDocument.class);
        } catch (JsonProcessingException | RuntimeException e) {
            String why = e instanceof JsonProcessingException j ? j.getOriginalMessage() : e.getMessage();
            throw new IllegalStateException("example " + slug + ".json is not a valid design: " + why, e);
        }
    }

    /** The examples in slug order. */
    public List<Example> all() {
        return List.copyOf(bySlug.values());
    }

    public List<String> slugs() {
        return List.copyOf(bySlug.keySet());
    }

    public Optional<Example> find(String slug) {
        return Optional.ofNullable(slug).map(bySlug::get);
    }

    /**
     * The example a form or request field names.
     *
     * @throws InvalidInputException naming {@code field} and the known slugs when it names none
     */
    public Example require(String field, String slug) {
        return find(slug).orElseThrow(() -> new InvalidInputException(new FieldError(field,
                slug == null ? "missing" : slug,
                field + (slug == null || slug.isBlank() ? " is missing" : " = \"" + slug + "\"")
                        + ": must name one of the example designs", String.join(", ", slugs()))));
    }

    /** Slug to file text, in slug order (for loading the examples as demo designs). */
    public Map<String, String> texts() {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        bySlug.forEach((slug, e) -> out.put(slug, e.text()));
        return out;
    }
}
