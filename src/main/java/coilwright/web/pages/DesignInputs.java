package coilwright.web.pages;

import coilwright.system.EvaluationRequest;
import coilwright.web.FormBinder;
import coilwright.web.Words;
import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Every input of a design as a reader of a saved design sees it: grouped as the parts of the machine (winding, rotor,
 * stator, wire, load, speeds), each field named in words with its value in the unit the design form shows it in
 * (mm, mm², °C, mH; inches and °F in imperial), choices in the trade's words.
 */
public final class DesignInputs {
    /** One group of inputs: its heading and its rows of label, value (with unit). */
    public record Group(String heading, List<List<String>> rows) {
    }

    private static final Map<String, String> GROUPS = groups();
    private static final Pattern NUMBER = Pattern.compile("-?\\d+(\\.\\d+)?([eE][-+]?\\d+)?");
    /** Unit suffixes of the API's field names, longest first, with the symbol shown when the field has no conversion. */
    private static final String[][] SUFFIXES = {{"VPerRpm", "V/rpm"}, {"Ohm", "Ω"}, {"Rpm", "rpm"}, {"M2", "m²"},
            {"Kg", "kg"}, {"Hz", "Hz"}, {"C", "°C"}, {"V", "V"}, {"H", "H"}, {"M", "m"}};

    private DesignInputs() {
    }

    private static Map<String, String> groups() {
        Map<String, String> g = new LinkedHashMap<>();
        g.put("alternator.winding.", "Winding");
        g.put("alternator.rotor.", "Rotor and magnets");
        g.put("alternator.stator.", "Stator");
        g.put("alternator.wire.", "Wire");
        g.put("alternator.", "Machine");
        g.put("load.battery.", "Battery");
        g.put("load.rectifier.", "Rectifier");
        g.put("load.acCable.", "AC cable");
        g.put("load.dcCable.", "DC cable");
        g.put("load.", "Load");
        g.put("speedRange.", "Speed range");
        g.put("", "Speeds");
        return g;
    }

    public static List<Group> of(EvaluationRequest design, Units units) {
        Map<String, List<List<String>>> rows = new LinkedHashMap<>();
        GROUPS.values().forEach(h -> rows.put(h, new ArrayList<>()));
        FormBinder.flatten(design).forEach((path, value) -> {
            String prefix = GROUPS.keySet().stream().filter(path::startsWith).findFirst().orElse("");
            String name = path.substring(path.lastIndexOf('.') + 1);
            if (name.equals("type")) {
                rows.get(GROUPS.get(prefix)).add(List.of("Kind", words(value)));
            } else {
                rows.get(GROUPS.get(prefix)).add(List.of(label(name), shown(path, name, value, units)));
            }
        });
        List<Group> out = new ArrayList<>();
        rows.forEach((h, r) -> {
            if (!r.isEmpty()) {
                out.add(new Group(h, r));
            }
        });
        return out;
    }

    private static String shown(String path, String name, String value, Units units) {
        if (!NUMBER.matcher(value).matches()) {
            return words(value);
        }
        double v = Double.parseDouble(value);
        Shown how = DesignFields.SHOWN.get(path);
        if (how != null) {
            return Fmt.plain(how.fromSi(v, units), 4) + " " + how.symbol(units);
        }
        String unit = unitOf(name);
        return Fmt.plain(v, 4) + (unit.isEmpty() ? "" : " " + unit);
    }

    private static String words(String value) {
        return value.matches("[A-Z][A-Za-z]+(Rotor|Stator|Load)") ? value.replaceAll("([a-z])([A-Z])", "$1 $2") : Words.of(value);
    }

    private static String unitOf(String name) {
        for (String[] s : SUFFIXES) {
            if (name.endsWith(s[0]) && name.length() > s[0].length()
                    && Character.isLowerCase(name.charAt(name.length() - s[0].length() - 1))) {
                return s[1];
            }
        }
        return "";
    }

    /** "magnetThicknessM" as "Magnet thickness"; "awg" as "AWG". */
    static String label(String name) {
        if (name.equals("awg")) {
            return "AWG";
        }
        String base = name;
        for (String[] s : SUFFIXES) {
            if (name.endsWith(s[0]) && name.length() > s[0].length()
                    && Character.isLowerCase(name.charAt(name.length() - s[0].length() - 1))) {
                base = name.substring(0, name.length() - s[0].length());
                break;
            }
        }
        String words = base.replaceAll("([a-z0-9])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
        return Character.toUpperCase(words.charAt(0)) + words.substring(1);
    }
}
