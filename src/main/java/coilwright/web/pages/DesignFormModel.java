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
import coilwright.system.EvaluationRequest;
import coilwright.web.FormResult;
import coilwright.web.Units;
import coilwright.winding.Layers;
import io.javalin.http.Context;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
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

    static void render(Context ctx, int status, FormResult<EvaluationRequest> form) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        m.put("unit", new FieldUnits(Units.of(ctx)));
        m.put("topologies", Topology.choices());
        Map<String, String> loads = new LinkedHashMap<>();
        loads.put("BATTERY", "Battery through a diode bridge");
        loads.put("RESISTOR", "Resistor bank (star)");
        m.put("loadTypes", loads);
        m.put("grades", MagnetGrades.names());
        m.put("phases", List.of("3", "1"));
        m.put("layers", names(Layers.values()));
        m.put("connections", names(Connection.values()));
        m.put("gauges", names(WireGauge.values()));
        m.put("grades12", List.of("2", "1"));
        m.put("coolings", names(Cooling.values()));
        m.put("classes", names(ThermalClass.values()));
        m.put("chemistries", names(Chemistry.values()));
        m.put("stages", names(ChargeStage.values()));
        m.put("bridges", names(BridgeType.values()));
        m.put("diodes", names(DiodeType.values()));
        ctx.status(status).render("design", m);
    }

    /** The form pre-filled with these values, for "change this design" on a results page. */
    static String editLink(Map<String, String> values) {
        return "/design/new?" + new TreeMap<>(values).entrySet().stream()
                .map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    private static List<String> names(Enum<?>[] values) {
        return Arrays.stream(values).map(Enum::name).toList();
    }
}
