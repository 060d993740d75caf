package coilwright.web.pages;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireGauge;
import coilwright.load.BridgeType;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.machine.Connection;
import coilwright.magnet.MagnetGrades;
import coilwright.web.Choice;
import coilwright.web.FormResult;
import coilwright.web.units.Units;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

/** The model of the design form page: the form, the choices of every select and the unit beside each field. */
final class DesignFormModel {
    static final String ENTERED_IN = "enteredIn";
    private DesignFormModel() {
    }

    /** The unit shown beside a field: {@code ${unit.of('alternator.rotor.airGapM')}}. */
    public record FieldUnits(Units units) {
        public String of(String field) {
            return DesignFields.symbol(field, units);
        }
    }

    /** The design template's model around a form. */
    static Map<String, Object> of(FormResult form, Units units) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        m.put("unitsLink", unitsLink(form.values(), units));
        m.put("unit", new FieldUnits(units));
        m.put("topologies", Choice.labelled(Topology.choices()));
        m.putAll(loadChoices(units));
        m.put("grades", Choice.of(MagnetGrades.names()));
        m.put("phases", Choice.of("3", "1"));
        m.put("layers", Choice.LAYERS);
        m.put("connections", Choice.names(Connection.values()));
        m.put("gauges", Choice.names(WireGauge.values()));
        m.put("grades12", Choice.of("2", "1"));
        m.put("coolings", Choice.names(Cooling.values()));
        m.put("classes", Choice.names(ThermalClass.values()));
        return m;
    }

    /** What the load fieldset ({@code fragments/design :: load}) needs besides the form: its choices and units. */
    static Map<String, Object> loadChoices(Units units) {
        Map<String, Object> m = new HashMap<>();
        m.put("unit", new FieldUnits(units));
        Map<String, String> loads = new LinkedHashMap<>();
        loads.put("BATTERY", "Battery through a diode bridge");
        loads.put("RESISTOR", "Resistor bank (star)");
        m.put("loadTypes", Choice.labelled(loads));
        m.put("chemistries", Choice.names(Chemistry.values()));
        m.put("stages", Choice.names(ChargeStage.values()));
        m.put("bridges", Choice.names(BridgeType.values()));
        m.put("diodes", Choice.names(DiodeType.values()));
        return m;
    }

    /**
     * The same form, as typed, at a GET address: the units switch of a form reached by POST (a rejected one) leads
     * here, and {@link #convertTyped} turns the numbers into the newly chosen units.
     */
    static String unitsLink(Map<String, String> typed, Units units) {
        return unitsLink("/design/new", typed, units);
    }

    /** As {@link #unitsLink(Map, Units)} for another GET address of the form (the revise form). */
    static String unitsLink(String path, Map<String, String> typed, Units units) {
        Map<String, String> q = new TreeMap<>(typed);
        q.remove(Units.PARAM);
        q.put(ENTERED_IN, units.name().toLowerCase(Locale.ROOT));
        return path + "?" + q.entrySet().stream()
                .map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
    }

    /**
     * Typed field values for a form shown in {@code units}: when {@code enteredIn} names other units, every readable
     * number of a field shown in a convertible unit is converted; anything else stays as typed.
     */
    static Map<String, String> convertTyped(Map<String, String> query, Units units) {
        Map<String, String> values = new HashMap<>(query);
        String from = values.remove(ENTERED_IN);
        Units typedIn = from == null ? units : Units.choose(from, null);
        if (typedIn != units) {
            DesignFields.SHOWN.forEach((field, shown) -> {
                String text = values.get(field);
                if (text != null && DesignForm.NUMBER.matcher(text.trim()).matches()) {
                    values.put(field, shown.text(shown.toSi(Double.parseDouble(text.trim()), typedIn), units));
                }
            });
        }
        return values;
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }
}
