package coilwright.web.match;

import coilwright.service.DesignDocument;
import coilwright.web.Json;
import coilwright.web.NotFoundException;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;

/** The example designs on the classpath ({@code examples/<slug>.json}) the match pages start from. */
final class Examples {
    static final List<String> SLUGS = List.of("axial-wind-24v", "radial-hydro-48v", "rewound-motor-12v");

    private Examples() {
    }

    static DesignDocument load(String slug) {
        if (!SLUGS.contains(slug)) {
            throw new NotFoundException("No example design named '" + slug + "'; known: " + String.join(", ", SLUGS));
        }
        try (InputStream in = Examples.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            if (in == null) {
                throw new NotFoundException("Example design '" + slug + "' is missing from the build");
            }
            return Json.mapper().readValue(in, DesignDocument.class);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
