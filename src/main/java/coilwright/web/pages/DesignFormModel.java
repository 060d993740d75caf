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
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

/** The model of the design form page: the form, the choices of every select and the unit beside each field. */
final class DesignFormModel {
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
        m.put("unit", new FieldUnits(units));
        m.put("topologies", Choice.labelled(Topology.choices()));
        Map<String, String> loads = new LinkedHashMap<>();
        loads.put("BATTERY", "Battery through a diode bridge");
        loads.put("RESISTOR", "Resistor bank (star)");
        m.put("loadTypes", Choice.labelled(loads));
        m.put("grades", Choice.of(MagnetGrades.names()));
        m.put("phases", Choice.of("3", "1"));
        m.put("layers", Choice.LAYERS);
        m.put("connections", Choice.names(Connection.values()));
        m.put("gauges", Choice.names(WireGauge.values()));
        m.put("grades12", Choice.of("2", "1"));
        m.put("coolings", Choice.names(Cooling.values()));
        m.put("classes", Choice.names(ThermalClass.values()));
        m.put("chemistries", Choice.names(Chemistry.values()));
        m.put("stages", Choice.names(ChargeStage.values()));
        m.put("bridges", Choice.names(BridgeType.values()));
        m.put("diodes", Choice.names(DiodeType.values()));
        return m;
    }

    /** The form pre-filled with these values, for "change this design" on a results page. */
    static String editLink(Map<String, String> values) {
        return "/design/new?" + new TreeMap<>(values).entrySet().stream()
                .map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }
}
