package coilwright.web.match;

import coilwright.web.units.Fmt;
import coilwright.web.units.ShownFields;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.Map;

/**
 * Values on the match forms that were probably typed in another unit than the field's: a stream given in m³/s in
 * the L/s field, a pipe bore or runner given in metres in a mm field, a rotor given in mm in the metres field. Each
 * gets a hint beside it with the value probably meant; nothing is changed (a hint, not a correction). The bounds are
 * far outside what the field could mean (common practice): no micro-hydro stream is under 0.1 L/s, no penstock or
 * runner under 5 mm, no small wind rotor over 50 m.
 */
final class UnitHints {
    private UnitHints() {
    }

    /** Field to hint, for the values as typed in {@code units}; only the SI form's units are checked. */
    static Map<String, String> of(Map<String, String> typed, Units units) {
        Map<String, String> hints = new HashMap<>();
        if (units != Units.SI) {
            return hints;
        }
        below(hints, typed, "site.designFlowM3s", 0.1, 1000, "L/s", "m³/s");
        below(hints, typed, "penstock.innerDiameterM", 5, 1000, "mm", "m");
        below(hints, typed, "runner.diameterM", 5, 1000, "mm", "m");
        String rotor = typed.get("rotor.diameterM");
        if (number(rotor) && Double.parseDouble(rotor.trim()) > 50 && Double.parseDouble(rotor.trim()) < 1e6) {
            hints.put("rotor.diameterM", hint(rotor.trim(), "m", Double.parseDouble(rotor.trim()) / 1000, "mm"));
        }
        return hints;
    }

    private static void below(Map<String, String> hints, Map<String, String> typed, String field, double bound,
                              double factor, String unit, String probableUnit) {
        String text = typed.get(field);
        if (number(text)) {
            double v = Double.parseDouble(text.trim());
            if (v > 0 && v < bound) {
                hints.put(field, hint(text.trim(), unit, v * factor, probableUnit));
            }
        }
    }

    private static String hint(String typed, String unit, double meant, String probableUnit) {
        return typed + " " + unit + " is unusual here: if it was in " + probableUnit + ", did you mean "
                + Fmt.plain(meant, 4) + " " + unit + "?";
    }

    private static boolean number(String text) {
        return text != null && ShownFields.NUMBER.matcher(text.trim()).matches();
    }
}
