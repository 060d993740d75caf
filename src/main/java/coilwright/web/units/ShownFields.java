package coilwright.web.units;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * The fields of a form that are shown in another unit than the core's SI value, by dotted field name (the API's
 * path; list items as {@code flowDuration[].flowM3s}, matching any index). Converts a whole form at the edge: typed
 * values to SI before binding, SI values to the shown unit when filling a form, and typed values from the units they
 * were typed in to newly chosen ones (the units switch). Text that is not a number is left as typed, so the binder
 * names it; so is a number too large for a double ("1e999"), which the binder refuses under its field.
 */
public record ShownFields(Map<String, Shown> fields) {
    /** A plain decimal number as people type it. */
    public static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    private static final Pattern INDEX = Pattern.compile("\\[\\d+]");

    public ShownFields {
        fields = Map.copyOf(fields);
    }

    /** How a field is shown, or null when it is shown as the core holds it. */
    public Shown of(String field) {
        return fields.get(INDEX.matcher(field).replaceAll("[]"));
    }

    /** The unit symbol beside a field in these units, empty when the field has no conversion. */
    public String symbol(String field, Units units) {
        Shown s = of(field);
        return s == null ? "" : s.symbol(units);
    }

    /** Typed values (in {@code units}) as SI text. */
    public Map<String, String> toSi(Map<String, String> typed, Units units) {
        return map(typed, (s, v) -> Double.toString(s.toSi(v, units)));
    }

    /** SI values as a form shows them in {@code units}. */
    public Map<String, String> fromSi(Map<String, String> si, Units units) {
        return map(si, (s, v) -> s.text(v, units));
    }

    /** Values typed in {@code from} as they read in {@code to}. */
    public Map<String, String> convert(Map<String, String> typed, Units from, Units to) {
        return from == to ? new LinkedHashMap<>(typed) : map(typed, (s, v) -> s.text(s.toSi(v, from), to));
    }

    private Map<String, String> map(Map<String, String> values, Conversion conversion) {
        Map<String, String> out = new LinkedHashMap<>(values);
        values.forEach((field, text) -> {
            Shown s = of(field);
            double v = s != null && text != null && NUMBER.matcher(text.trim()).matches() ? Double.parseDouble(text.trim())
                    : Double.NaN;
            if (Double.isFinite(v)) {
                out.put(field, conversion.apply(s, v));
            }
        });
        return out;
    }

    private interface Conversion {
        String apply(Shown shown, double value);
    }
}
