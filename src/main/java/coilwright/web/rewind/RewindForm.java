package coilwright.web.rewind;

import coilwright.web.units.Quantity;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The {@code /rewind} form: its starting values (an invented machine: a 12-coil, 16-pole air-cored stator read at
 * 300 rpm) and the few edge rules a form needs beyond the API: a blank "0 = not known" field means 0, and a blank
 * coil-window area means the window is unknown.
 */
final class RewindForm {
    /** Fields where 0 means "unknown" or "not measured", or that belong to the other target kind. */
    static final List<String> BLANK_IS_ZERO = List.of("machine.poles", "machine.coilPitchSlots",
            "machine.coilsPerPhase", "machine.wire.awg", "machine.wire.bareDiameterM",
            "machine.measurements.measuredFrequencyHz", "machine.measurements.lineResistanceOhm",
            "machine.measurements.lineInductanceH", "target.batteryVoltageV", "target.cutInSpeedRpm",
            "target.diodeDropV", "target.lineVoltageRmsV", "target.voltageSpeedRpm");
    static final String WINDOW = "machine.coilWindow.";
    /** Fields entered in a convertible unit. */
    static final Map<String, Quantity> FIELD_UNITS = Map.of(
            "machine.measurements.measuredTemperatureC", Quantity.TEMPERATURE,
            "target.windingTemperatureC", Quantity.TEMPERATURE);

    private RewindForm() {
    }

    /** The starting values, shown in the request's units. */
    static Map<String, String> defaults(Units units) {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("machine.slots", "12");
        v.put("machine.poles", "16");
        v.put("machine.phases", "3");
        v.put("machine.layers", "DOUBLE");
        v.put("machine.coilPitchSlots", "0");
        v.put("machine.connection", "STAR");
        v.put("machine.coilsPerPhase", "0");
        v.put("machine.parallelPaths", "1");
        v.put("machine.turnsPerCoil", "60");
        v.put("machine.wire.gauge", "AWG");
        v.put("machine.wire.awg", "16");
        v.put("machine.wire.bareDiameterM", "");
        v.put("machine.wire.insulationGrade", "2");
        v.put("machine.wire.strandsInHand", "1");
        v.put("machine.coilWindow.areaM2", "");
        v.put("machine.coilWindow.kind", "AIR_CORED");
        v.put("machine.measurements.openCircuitLineVoltageRmsV", "41.5");
        v.put("machine.measurements.measuredSpeedRpm", "300");
        v.put("machine.measurements.measuredFrequencyHz", "40");
        v.put("machine.measurements.lineResistanceOhm", "1.45");
        v.put("machine.measurements.measuredTemperatureC", temperature(units, 20));
        v.put("machine.measurements.lineInductanceH", "0.004");
        v.put("machine.measurements.voltageAccuracyPercent", "1");
        v.put("machine.measurements.speedAccuracyPercent", "1");
        v.put("machine.measurements.frequencyAccuracyPercent", "0.5");
        v.put("machine.measurements.resistanceAccuracyPercent", "2");
        v.put("target.kind", "BATTERY_CUT_IN");
        v.put("target.batteryVoltageV", "24");
        v.put("target.cutInSpeedRpm", "150");
        v.put("target.diodeDropV", "0.8");
        v.put("target.lineVoltageRmsV", "");
        v.put("target.voltageSpeedRpm", "");
        v.put("target.targetSpeedRpm", "400");
        v.put("target.windingTemperatureC", temperature(units, 60));
        return v;
    }

    /** Starting values of the bare-stator form. */
    static Map<String, String> statorDefaults() {
        return Map.of("slots", "36", "phases", "3", "layers", "DOUBLE", "minPoles", "2", "maxPoles", "48",
                "rankBy", "WINDING_FACTOR");
    }

    /** The posted fields with the form's edge rules applied (blank zero-fields as 0, blank window dropped). */
    static Map<String, List<String>> prepare(Map<String, List<String>> posted) {
        Map<String, List<String>> out = new HashMap<>(posted);
        for (String f : BLANK_IS_ZERO) {
            if (blank(out.get(f))) {
                out.put(f, List.of("0"));
            }
        }
        if (blank(out.get(WINDOW + "areaM2"))) {
            new ArrayList<>(out.keySet()).stream().filter(k -> k.startsWith(WINDOW)).forEach(out::remove);
        }
        return out;
    }

    private static boolean blank(List<String> values) {
        return values == null || values.isEmpty() || values.get(0).isBlank();
    }

    private static String temperature(Units units, double celsius) {
        return Shown.CELSIUS.text(celsius, units);
    }
}
