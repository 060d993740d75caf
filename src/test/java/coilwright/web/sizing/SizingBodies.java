package coilwright.web.sizing;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/** Request bodies of our own invention under {@code src/test/resources/sizing/}, as trees to change. */
final class SizingBodies {
    private static final ObjectMapper JSON = new ObjectMapper();

    private SizingBodies() {
    }

    /**
     * The worked example of {@code SizingWorkedExampleTest}: a 3 m rotor on a 5 m/s site, 24 V lead-acid, one
     * 390 mm disc size and a 16 mm stator, 16 poles, 16 to 24 turns of AWG 13 (72 candidates).
     */
    static ObjectNode small() {
        return read("small-axial-wind-24v");
    }

    /** The same rotor and battery over three disc sizes, two stators, 12 to 20 poles, 10 to 120 turns (863 136). */
    static ObjectNode axialWind24V() {
        return read("axial-wind-24v");
    }

    static ObjectNode read(String name) {
        try (InputStream in = SizingBodies.class.getClassLoader().getResourceAsStream("sizing/" + name + ".json")) {
            return (ObjectNode) JSON.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
