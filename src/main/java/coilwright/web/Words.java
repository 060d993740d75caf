package coilwright.web;

import java.util.Locale;
import java.util.Map;

/**
 * The words a practitioner uses for the core's enum values: pages and selects show these, the API keeps the enum
 * names. A value with no entry is shown as a sentence made of its name ("ENCLOSED_NATURAL" would read "Enclosed
 * natural"), so no code name ever reaches a page.
 */
public final class Words {
    private static final Map<String, String> WORDS = Map.ofEntries(
            Map.entry("STAR", "Star (Y)"),
            Map.entry("DELTA", "Delta"),
            Map.entry("DOUBLE", "Double layer"),
            Map.entry("SINGLE", "Single layer"),
            Map.entry("LEAD_ACID", "Lead-acid"),
            Map.entry("LIFEPO4", "LiFePO4 (lithium iron phosphate)"),
            Map.entry("CUSTOM", "Other (give the bank voltage)"),
            Map.entry("NOMINAL", "Nominal (resting)"),
            Map.entry("ABSORB", "Absorption (bulk charging)"),
            Map.entry("FLOAT", "Float"),
            Map.entry("THREE_PHASE_BRIDGE", "Three-phase bridge"),
            Map.entry("SINGLE_PHASE_BRIDGE", "Single-phase bridge"),
            Map.entry("SILICON", "Silicon"),
            Map.entry("SCHOTTKY", "Schottky"),
            Map.entry("AWG", "AWG gauge"),
            Map.entry("METRIC", "Metric diameter"),
            Map.entry("ENCLOSED_NATURAL", "Enclosed, natural cooling"),
            Map.entry("OPEN_VENTILATED", "Open frame, ventilated"),
            Map.entry("AIR_COOLED_AXIAL_OPEN_COIL", "Open air-cored coils, air-cooled"),
            Map.entry("FORCED_AIR", "Fan-cooled (forced air)"),
            Map.entry("LIQUID", "Liquid-cooled"),
            Map.entry("IMPULSE", "Pelton (impulse)"),
            Map.entry("TURGO", "Turgo"),
            Map.entry("CROSSFLOW", "Crossflow"),
            Map.entry("FREE_SPINNING", "free-spinning (no charging)"),
            Map.entry("STALL", "stalled"),
            Map.entry("OVER_SPEED", "over the speed limit"),
            Map.entry("ABOVE_OPTIMUM", "faster than best tip-speed ratio"),
            Map.entry("PVC", "PVC"),
            Map.entry("HDPE", "HDPE (polyethylene)"),
            Map.entry("COMMERCIAL_STEEL", "Commercial steel"),
            Map.entry("GALVANIZED_STEEL", "Galvanised steel"),
            Map.entry("CAST_IRON", "Cast iron"),
            Map.entry("CONCRETE", "Concrete"),
            Map.entry("DANGER", "Danger"),
            Map.entry("WARNING", "Warning"),
            Map.entry("NOTICE", "Note"));

    private Words() {
    }

    /** The word for an enum value. */
    public static String of(Enum<?> value) {
        return of(value.name());
    }

    /** The word for an enum value's name (thermal classes and grades stay as they are: "F", "N42"). */
    public static String of(String name) {
        String w = WORDS.get(name);
        if (w != null) {
            return w;
        }
        if (!name.contains("_")) {
            return name;
        }
        String s = name.replace('_', ' ').toLowerCase(Locale.ROOT);
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
