package coilwright.losses;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Common fully processed non-oriented electrical steels by their EN 10106 / IEC 60404-8-4 names, plus a
 * conservative stand-in for laminations of unknown grade. The name states the guarantee: {@code M400-50A} is
 * at most 4.00 W/kg at 1.5 T, 50 Hz, 0.50 mm thick, fully processed (EN 10027-1 designation rule). The 1.0 T
 * guarantees are from memory of EN 10106 Table 1; resistivities are typical data-sheet values for the silicon
 * content of each loss class and densities the standard's conventional values (both from memory).
 */
public final class ElectricalSteels {
    /** Name of the stand-in for motor laminations of unknown grade. */
    public static final String UNKNOWN_MOTOR_LAMINATION = "unknown motor lamination";
    private static final String STANDARD = "EN 10106 / IEC 60404-8-4 guaranteed maxima (1.5 T figure from the grade "
            + "name; 1.0 T figure, resistivity and density from memory)";
    private static final String UNKNOWN_SOURCE = "conservative stand-in (from memory): 0.65 mm low-silicon steel, "
            + "11 W/kg at 1.5 T and 5 W/kg at 1.0 T, above the highest-loss EN 10106 grade M1000-65A and the "
            + "non-alloyed EN 10126 grades, as old or unannealed motor laminations can be";

    private static final Map<String, ElectricalSteel> BY_NAME = build();

    private ElectricalSteels() {
    }

    private static Map<String, ElectricalSteel> build() {
        Map<String, ElectricalSteel> m = new LinkedHashMap<>();
        add(m, "M270-35A", 0.35, 7600, 0.59e-6, 2.70, 1.10);
        add(m, "M330-35A", 0.35, 7650, 0.52e-6, 3.30, 1.30);
        add(m, "M330-50A", 0.50, 7650, 0.52e-6, 3.30, 1.35);
        add(m, "M400-50A", 0.50, 7700, 0.42e-6, 4.00, 1.70);
        add(m, "M470-50A", 0.50, 7700, 0.39e-6, 4.70, 2.00);
        add(m, "M530-50A", 0.50, 7700, 0.36e-6, 5.30, 2.30);
        add(m, "M600-50A", 0.50, 7750, 0.30e-6, 6.00, 2.60);
        add(m, "M700-50A", 0.50, 7800, 0.26e-6, 7.00, 3.00);
        add(m, "M800-50A", 0.50, 7800, 0.24e-6, 8.00, 3.60);
        add(m, "M800-65A", 0.65, 7800, 0.25e-6, 8.00, 3.60);
        add(m, "M1000-65A", 0.65, 7800, 0.20e-6, 10.00, 4.40);
        m.put(UNKNOWN_MOTOR_LAMINATION, ElectricalSteel.fromGuaranteedLosses(UNKNOWN_MOTOR_LAMINATION, 0.65e-3,
                7800, 0.20e-6, 11.0, 5.0, UNKNOWN_SOURCE));
        return Collections.unmodifiableMap(m);
    }

    private static void add(Map<String, ElectricalSteel> m, String name, double thicknessMm, double density,
                            double resistivity, double p15, double p10) {
        m.put(name, ElectricalSteel.fromGuaranteedLosses(name, thicknessMm * 1e-3, density, resistivity, p15, p10,
                STANDARD));
    }

    /** Every grade in catalogue order, the unknown stand-in last. */
    public static List<ElectricalSteel> all() {
        return List.copyOf(BY_NAME.values());
    }

    /** The allowed names. */
    public static List<String> names() {
        return List.copyOf(BY_NAME.keySet());
    }

    /** The grade of that name (case and surrounding blanks ignored). */
    public static Optional<ElectricalSteel> find(String name) {
        if (name == null) {
            return Optional.empty();
        }
        String wanted = name.strip();
        return BY_NAME.values().stream().filter(s -> s.name().equalsIgnoreCase(wanted)).findFirst();
    }

    /**
     * @throws InvalidInputException on field {@code steelName} listing the allowed names
     */
    public static ElectricalSteel byName(String name) {
        return find(name).orElseThrow(() -> new InvalidInputException(List.of(new FieldError("steelName",
                String.valueOf(name), "steelName = " + name + ": unknown electrical steel; allowed: "
                + String.join(", ", names()), String.join(", ", names())))));
    }
}
