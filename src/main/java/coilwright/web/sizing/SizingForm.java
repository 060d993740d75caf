package coilwright.web.sizing;

import coilwright.load.Chemistry;
import coilwright.sizing.SizingRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.RecordBinder;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * The sizing page's form in the trade's units (rotor diameter in m, wind in m/s, head in m and flow in L/s, battery
 * by nominal volts, magnets and stator in mm) to a {@link SizingRequest}: the fields are put into the API's JSON tree,
 * converted to SI, and bound by the same {@link RecordBinder}, so the page and the API share every message. A field
 * the request names is shown beside its form field ({@link #onForm}).
 */
final class SizingForm {
    static final String DRIVE = "driveType";
    static final String BUILD = "buildType";
    private static final Pattern LIST_SEPARATOR = Pattern.compile("[,;\\s]+");
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /**
     * A form field: its request path, the factor from the shown unit to SI (0 for whole numbers, -1 for text) and
     * the shown unit when it is not the request's own.
     */
    private record Field(String name, String path, double toSi, String shownUnit) {
    }

    private static final List<Field> WIND = List.of(
            new Field("rotorDiameterM", "drive.rotor.diameterM", 1, ""),
            new Field("furlingRpm", "drive.rotor.maxRotorSpeedRpm", 1, ""),
            new Field("meanWindMs", "drive.wind.meanWindSpeedMs", 1, ""),
            new Field("ratedWindMs", "drive.ratedWindSpeedMs", 1, ""),
            new Field("cutInWindMs", "limits.maxCutInWindSpeedMs", 1, ""));
    private static final List<Field> HYDRO = List.of(
            new Field("headM", "drive.site.grossHeadM", 1, ""),
            new Field("flowLps", "drive.site.designFlowM3s", 1e-3, "L/s"),
            new Field("penstockLengthM", "drive.penstock.lengthM", 1, ""),
            new Field("penstockDiameterMm", "drive.penstock.innerDiameterM", 1e-3, "mm"),
            new Field("runnerRpm", "drive.runner.targetSpeedRpm", 1, ""),
            new Field("driveRatio", "drive.driveRatio", 1, ""));
    private static final List<Field> AXIAL = List.of(
            new Field("discDiameterMm", "build.discDiametersM", 1e-3, "mm"),
            new Field("coilThicknessMm", "build.coilLayerThicknessesM", 1e-3, "mm"));
    private static final List<Field> RADIAL = List.of(
            new Field("boreMm", "build.gapDiameterM", 1e-3, "mm"),
            new Field("stackMm", "build.stackLengthM", 1e-3, "mm"),
            new Field("slots", "build.slots", 0, ""),
            new Field("slotDepthMm", "build.stator.slotDepthM", 1e-3, "mm"),
            new Field("slotWidthMm", "build.stator.slotWidthM", 1e-3, "mm"));
    private static final List<Field> COMMON = List.of(
            new Field("cableLengthM", "load.acCable.lengthM", 1, ""),
            new Field("cableAreaMm2", "load.acCable.conductorAreaM2", 1e-6, "mm²"),
            new Field("minPoles", "build.minPoles", 0, ""),
            new Field("maxPoles", "build.maxPoles", 0, ""),
            new Field("magnetGrade", "build.magnets[0].gradeName", -1, ""),
            new Field("magnetWidthMm", "build.magnets[0].widthM", 1e-3, "mm"),
            new Field("magnetLengthMm", "build.magnets[0].lengthM", 1e-3, "mm"),
            new Field("magnetThicknessMm", "build.magnets[0].thicknessM", 1e-3, "mm"),
            new Field("minTurns", "winding.minTurnsPerCoil", 0, ""),
            new Field("maxTurns", "winding.maxTurnsPerCoil", 0, ""),
            new Field("thickestAwg", "winding.wire.thickestAwg", 0, ""),
            new Field("thinnestAwg", "winding.wire.thinnestAwg", 0, ""),
            new Field("maxStrands", "winding.wire.maxStrands", 0, ""),
            new Field("maxCurrentDensity", "limits.maxCurrentDensityAPerMm2", 1, ""),
            new Field("minEfficiencyPct", "limits.minEfficiency", 0.01, "%"),
            new Field("maxOpenCircuitV", "limits.maxOpenCircuitLineRmsV", 1, ""),
            new Field("objective", "objective", -1, ""),
            new Field("copperPrice", "prices.copperPerKg", 1, ""),
            new Field("magnetPrice", "prices.rareEarthMagnetPerKg", 1, ""));

    /**
     * The defaults: the worked example's 3 m rotor on a 5 m/s site charging 24 V, one disc and stator size, a space
     * small enough (2 856 candidates) to be answered while the user waits.
     */
    static Map<String, String> defaults() {
        Map<String, String> v = new LinkedHashMap<>();
        v.put(DRIVE, "WIND");
        v.put("rotorDiameterM", "3");
        v.put("furlingRpm", "500");
        v.put("meanWindMs", "5");
        v.put("ratedWindMs", "10");
        v.put("cutInWindMs", "3.5");
        v.put("headM", "30");
        v.put("flowLps", "12");
        v.put("penstockLengthM", "150");
        v.put("penstockDiameterMm", "100");
        v.put("runnerRpm", "375");
        v.put("driveRatio", "2");
        v.put("chemistry", "LEAD_ACID");
        v.put("batteryV", "24");
        v.put("cableLengthM", "30");
        v.put("cableAreaMm2", "10");
        v.put(BUILD, "AXIAL");
        v.put("discDiameterMm", "390");
        v.put("coilThicknessMm", "16");
        v.put("boreMm", "140");
        v.put("stackMm", "80");
        v.put("slots", "24");
        v.put("slotDepthMm", "24");
        v.put("slotWidthMm", "8");
        v.put("minPoles", "14");
        v.put("maxPoles", "16");
        v.put("magnetGrade", "N42");
        v.put("magnetWidthMm", "40");
        v.put("magnetLengthMm", "50");
        v.put("magnetThicknessMm", "10");
        v.put("minTurns", "14");
        v.put("maxTurns", "30");
        v.put("thickestAwg", "12");
        v.put("thinnestAwg", "14");
        v.put("maxStrands", "2");
        v.put("maxCurrentDensity", "0");
        v.put("minEfficiencyPct", "0");
        v.put("maxOpenCircuitV", "0");
        v.put("objective", "ANNUAL_ENERGY");
        v.put("copperPrice", "15");
        v.put("magnetPrice", "60");
        return v;
    }

    private final RecordBinder binder;

    SizingForm(RecordBinder binder) {
        this.binder = binder;
    }

    /**
     * The request the form describes.
     *
     * @throws InvalidInputException every invalid field, under its request path (see {@link #onForm})
     */
    SizingRequest bind(Map<String, String> typed) {
        boolean wind = !"HYDRO".equals(typed.get(DRIVE));
        boolean axial = !"RADIAL".equals(typed.get(BUILD));
        ObjectNode tree = skeleton(wind, axial, typed);
        List<FieldError> errors = new ArrayList<>();
        List<Field> fields = new ArrayList<>(COMMON);
        fields.addAll(wind ? WIND : HYDRO);
        fields.addAll(axial ? AXIAL : RADIAL);
        for (Field f : fields) {
            put(tree, f, typed.getOrDefault(f.name(), "").trim(), errors);
        }
        cells(tree, typed, errors);
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
        try {
            return binder.bind(tree, SizingRequest.class);
        } catch (InvalidInputException e) {
            throw new InvalidInputException(e.errors().stream().map(err -> asTyped(err, typed)).toList());
        }
    }

    /** A message about a converted field starts with the value as the user typed it, in the form's unit. */
    private static FieldError asTyped(FieldError e, Map<String, String> typed) {
        String name = onForm(e.field());
        for (List<Field> group : List.of(WIND, HYDRO, AXIAL, RADIAL, COMMON)) {
            for (Field f : group) {
                if (f.name().equals(name) && !f.shownUnit().isEmpty()) {
                    return new FieldError(e.field(), e.value(), typed.getOrDefault(name, "") + " " + f.shownUnit()
                            + " is out of range (the request in SI units: " + e.message() + ")", e.allowed());
                }
            }
        }
        return e;
    }

    /** The form field that shows a message about a request path; the path itself when no field shows it. */
    static String onForm(String path) {
        for (List<Field> group : List.of(WIND, HYDRO, AXIAL, RADIAL, COMMON)) {
            for (Field f : group) {
                if (path.equals(f.path()) || path.startsWith(f.path() + "[") || path.startsWith(f.path() + ".")) {
                    return f.name();
                }
            }
        }
        return path.equals("load.battery.cells") || path.startsWith("load.battery") ? "batteryV" : path;
    }

    /** Battery cells from the nominal voltage: 2 V a cell for lead-acid, 3.2 V for LiFePO4 (common practice). */
    private static void cells(ObjectNode tree, Map<String, String> typed, List<FieldError> errors) {
        Chemistry chemistry = "LIFEPO4".equals(typed.get("chemistry")) ? Chemistry.LIFEPO4 : Chemistry.LEAD_ACID;
        double cellV = chemistry == Chemistry.LIFEPO4 ? 3.2 : 2.0;
        String text = typed.getOrDefault("batteryV", "").trim();
        ObjectNode battery = (ObjectNode) tree.at("/load/battery");
        battery.put("chemistry", chemistry.name());
        try {
            double v = Double.parseDouble(text);
            double cells = v / cellV;
            if (!Double.isFinite(v) || v <= 0 || Math.abs(cells - Math.rint(cells)) > 1e-9 || cells > 400) {
                errors.add(new FieldError("batteryV", text, "batteryV = " + text + ": must be a whole number of "
                        + String.format(Locale.ROOT, "%.1f V cells", cellV) + " for " + chemistry,
                        String.format(Locale.ROOT, "multiples of %.1f V, up to %.0f V", cellV, 400 * cellV)));
            } else {
                battery.put("cells", (int) Math.rint(cells));
            }
        } catch (NumberFormatException e) {
            errors.add(new FieldError("batteryV", text, "batteryV = " + text + ": must be a number of volts",
                    "12, 24, 48 ..."));
        }
    }

    private static void put(ObjectNode tree, Field f, String text, List<FieldError> errors) {
        if (text.isEmpty()) {
            errors.add(new FieldError(f.name(), "", f.name() + ": is required", "a value"));
            return;
        }
        String[] path = f.path().replace("[0]", "").split("\\.");
        ObjectNode parent = tree;
        for (int i = 0; i < path.length - 1; i++) {
            parent = parent.has(path[i]) && parent.get(path[i]).isObject() ? (ObjectNode) parent.get(path[i])
                    : parent.has(path[i]) && parent.get(path[i]).isArray() ? (ObjectNode) parent.get(path[i]).get(0)
                    : parent.putObject(path[i]);
        }
        String leaf = path[path.length - 1];
        if (f.toSi() < 0) {
            parent.put(leaf, text);
            return;
        }
        boolean list = f.path().endsWith("sM") && (f.path().contains("discDiameters") || f.path().contains("Thicknesses"));
        try {
            if (list) {
                ArrayNode values = parent.putArray(leaf);
                for (String part : LIST_SEPARATOR.split(text)) {
                    values.add(Double.parseDouble(part) * f.toSi());
                }
            } else if (f.toSi() == 0) {
                parent.put(leaf, Integer.parseInt(text));
            } else {
                parent.put(leaf, Double.parseDouble(text) * f.toSi());
            }
        } catch (NumberFormatException e) {
            errors.add(new FieldError(f.name(), text, f.name() + " = " + text + ": must be "
                    + (f.toSi() == 0 ? "a whole number" : list ? "numbers separated by commas" : "a number"),
                    f.toSi() == 0 ? "whole numbers" : "numbers"));
        }
    }

    /** Everything the form does not ask for: common-practice choices of a small home-built machine. */
    private static ObjectNode skeleton(boolean wind, boolean axial, Map<String, String> typed) {
        ObjectNode t = NODES.objectNode();
        ObjectNode drive = t.putObject("drive");
        if (wind) {
            drive.put("type", "WindDrive").put("maxWindSpeedMs", 25);
            ObjectNode rotor = drive.putObject("rotor").put("bladeCount", 3).put("driveRatio", 1.0)
                    .put("drivetrainEfficiency", 1.0);
            rotor.putObject("curve").put("type", "ParametricCp").put("cpMax", 0.40).put("tipSpeedRatioOpt", 6.5);
            drive.putObject("site").put("altitudeM", 0).put("temperatureC", 15).put("airDensityKgM3", 0);
            drive.putObject("wind").put("weibullShapeK", 2.0);
        } else {
            drive.put("type", "HydroDrive").put("drivetrainEfficiency", 0.95).put("waterTempC", 10);
            drive.putObject("site").putArray("flowDuration");
            drive.putObject("penstock").put("roughnessM", 1.5e-6).put("hazenWilliamsC", 150).put("sumMinorLossK", 2.0);
            drive.putObject("runner").put("kind", "IMPULSE").put("jetCount", 2).put("diameterM", 0)
                    .put("peakEfficiency", 0);
        }
        ObjectNode load = t.putObject("load");
        load.putObject("battery").put("customVoltageV", 0).put("stage", "NOMINAL").put("internalResistanceOhm", 0);
        load.putObject("rectifier").put("type", "THREE_PHASE_BRIDGE").put("diode", "SILICON").put("forwardDropV", 0.8);
        load.putObject("acCable").put("temperatureC", 30);
        load.putObject("dcCable").put("lengthM", 3).put("conductorAreaM2", 25e-6).put("temperatureC", 25);
        ObjectNode build = t.putObject("build");
        if (axial) {
            build.put("type", "AxialBuild").put("rimMarginM", 0.01).put("clearancePerSideM", 0.0015)
                    .put("coilGapM", 0.001).put("magnetTempC", 40);
        } else {
            build.put("type", "RadialBuild").put("side", "INNER").put("airGapM", 0.001).put("slotOpeningM", 0.0025)
                    .put("magnetTempC", 60);
            build.putArray("layers").add("DOUBLE");
            build.putObject("stator").put("toothTipHeightM", 0.0015).put("slotLinerThicknessM", 0.0002)
                    .put("endExtensionM", 0.006);
        }
        build.putArray("magnets").addObject().putArray("countsPerPole").add(1);
        ObjectNode winding = t.putObject("winding").put("maxParallelPaths", 2).put("minWindingFactor", 0.85)
                .put("cooling", axial ? "AIR_COOLED_AXIAL_OPEN_COIL" : "OPEN_VENTILATED")
                .put("insulationClass", axial ? "H" : "F").put("windingTempC", axial ? 70 : 90);
        winding.putArray("connections").add("STAR").add("DELTA");
        winding.putObject("wire").put("gauge", "AWG").put("minDiameterM", 0).put("maxDiameterM", 0)
                .put("insulationGrade", 2);
        t.putObject("limits").put("maxFill", 0);
        t.putObject("prices").put("ferriteMagnetPerKg", 8);
        t.put("resultCount", 10).put("maxFullEvaluations", 2000);
        if (!wind) {
            ((ObjectNode) t.get("limits")).put("maxCutInWindSpeedMs", 0);
        }
        return t;
    }
}
