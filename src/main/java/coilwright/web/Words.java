package coilwright.web;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

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

    /** Symbols written plainly in the core's messages, as a page shows them. */
    private static final String[][] SYMBOLS = {
            {"A/mm^2", "A/mm²"}, {"mm^2", "mm²"}, {"m^2", "m²"}, {"m^3", "m³"}, {"N*m", "N·m"}, {"R_LL", "R line-to-line"}};
    private static final Pattern CODE_NAME = Pattern.compile("\\b[A-Z][A-Z0-9]*_[A-Z0-9_]+\\b");
    private static final Pattern DEGREES = Pattern.compile("(\\d) C\\b");
    private static final Pattern OHM = Pattern.compile("(\\d) ?[Oo]hms?\\b");

    /** One instance for templates: {@code ${words.of(x)}}, {@code ${words.inText(message)}}. */
    public static final Words INSTANCE = new Words();

    private Words() {
    }

    /** As {@link #of(Enum)}, for templates. */
    public String word(Enum<?> value) {
        return of(value);
    }

    /** As {@link #of(String)}, for templates (a severity read from a saved snapshot). */
    public String word(String name) {
        return of(name);
    }

    /** Enum values in words, joined by commas: a match point's flags. */
    public String list(List<? extends Enum<?>> values) {
        return values.stream().map(Words::of).collect(Collectors.joining(", "));
    }

    /**
     * A message of the core as a page shows it: code names in words, "70 C" as "70 °C", "A/mm^2" as "A/mm²",
     * "N*m" as "N·m", ohms as Ω.
     */
    public static String inText(String message) {
        if (message == null) {
            return "";
        }
        String s = message;
        for (String[] sym : SYMBOLS) {
            s = s.replace(sym[0], sym[1]);
        }
        s = DEGREES.matcher(s).replaceAll("$1 °C");
        s = OHM.matcher(s).replaceAll("$1 Ω");
        Matcher m = CODE_NAME.matcher(s);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(out, Matcher.quoteReplacement(of(m.group()).toLowerCase(Locale.ROOT)));
        }
        m.appendTail(out);
        return out.toString();
    }

    /** As {@link #inText(String)}, for templates. */
    public String text(String message) {
        return inText(message);
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
