package coilwright.web.pages;

import com.fasterxml.jackson.databind.node.ObjectNode;
import coilwright.load.BatteryLoad;
import coilwright.load.ResistiveLoad;
import coilwright.system.EvaluationRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.FormBinder;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The design form bound into the API's {@link EvaluationRequest}, so the page shows the API's own messages.
 * Lengths are entered in mm (or in), cable in m and mm², temperatures in °C (or °F): converted to SI here. The
 * form carries both rotor/stator groups and both loads; the {@code topology} and {@code loadType} choices say
 * which one is bound (the field names of the groups do not overlap, so each keeps its API path).
 */
final class DesignForm {
    static final String LOAD_TYPE = "loadType";
    static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    private static final Map<String, Class<?>> LOADS = Map.of("BATTERY", BatteryLoad.class, "RESISTOR", ResistiveLoad.class);
    private final RecordBinder records = new RecordBinder(Json.mapper());
    private final FormBinder forms = new FormBinder(records);

    /**
     * Binds posted fields.
     *
     * @throws InvalidInputException listing every invalid field, the topology and load choices included
     * @throws coilwright.validation.InfeasibleDesignException when a part of the design is physically impossible
     */
    EvaluationRequest bind(Map<String, List<String>> posted, Units units) {
        Map<String, String> typed = new LinkedHashMap<>();
        posted.forEach((k, v) -> typed.put(k, v.isEmpty() ? "" : v.get(0).trim()));
        Optional<Topology> topology = Topology.parse(typed.get(Topology.FIELD));
        Class<?> load = LOADS.get(typed.getOrDefault(LOAD_TYPE, ""));
        if (topology.isEmpty() || load == null) {
            throw new InvalidInputException(choiceErrors(typed, topology.isEmpty(), load == null));
        }
        Map<String, List<String>> si = toSi(typed, units);
        ObjectNode tree = forms.toTree(si, EvaluationRequest.class, Units.SI, Map.of());
        ObjectNode alternator = tree.with("alternator");
        alternator.set("rotor", variant(si, "alternator.rotor.", topology.get().rotor()));
        if (!topology.get().side().isEmpty()) {
            ((ObjectNode) alternator.get("rotor")).put("side", topology.get().side());
        }
        alternator.set("stator", variant(si, "alternator.stator.", topology.get().stator()));
        tree.set("load", variant(si, "load.", load));
        return records.bind(tree, EvaluationRequest.class);
    }

    /** A design as the form shows it: every field in its shown unit, plus the topology and load choices. */
    static Map<String, String> values(EvaluationRequest design, Units units) {
        Map<String, String> flat = new HashMap<>(FormBinder.flatten(design));
        DesignFields.SHOWN.forEach((field, shown) -> {
            String si = flat.get(field);
            if (si != null) {
                flat.put(field, shown.text(Double.parseDouble(si), units));
            }
        });
        flat.put(Topology.FIELD, Topology.of(flat).name());
        flat.put(LOAD_TYPE, design.load() instanceof ResistiveLoad ? "RESISTOR" : "BATTERY");
        return flat;
    }

    private ObjectNode variant(Map<String, List<String>> si, String prefix, Class<?> type) {
        Map<String, List<String>> part = new HashMap<>();
        si.forEach((k, v) -> {
            if (k.startsWith(prefix)) {
                part.put(k.substring(prefix.length()), v);
            }
        });
        ObjectNode node = forms.toTree(part, type, Units.SI, Map.of());
        node.put(Json.TYPE_PROPERTY, type.getSimpleName());
        return node;
    }

    /** Entered numbers of converted fields as SI text; anything unreadable stays as typed for the binder to name. */
    private static Map<String, List<String>> toSi(Map<String, String> typed, Units units) {
        Map<String, List<String>> si = new HashMap<>();
        typed.forEach((field, text) -> {
            Shown shown = DesignFields.SHOWN.get(field);
            boolean convert = shown != null && NUMBER.matcher(text).matches();
            si.put(field, List.of(convert ? Double.toString(shown.toSi(Double.parseDouble(text), units)) : text));
        });
        return si;
    }

    private static List<FieldError> choiceErrors(Map<String, String> typed, boolean topology, boolean load) {
        List<FieldError> errors = new java.util.ArrayList<>();
        if (topology) {
            errors.add(choice(Topology.FIELD, typed.get(Topology.FIELD), Arrays.stream(Topology.values()).map(Enum::name).toList()));
        }
        if (load) {
            errors.add(choice(LOAD_TYPE, typed.get(LOAD_TYPE), List.copyOf(new java.util.TreeSet<>(LOADS.keySet()))));
        }
        return errors;
    }

    private static FieldError choice(String field, String value, List<String> allowed) {
        String shown = value == null ? "missing" : "\"" + value + "\"";
        return new FieldError(field, value == null ? "missing" : value,
                field + " = " + shown + ": must be one of " + String.join(", ", allowed), String.join(", ", allowed));
    }
}
