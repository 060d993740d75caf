package coilwright.web.sizing;

import coilwright.load.Chemistry;
import coilwright.sizing.SizingRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.system.WindMatchRequest;
import coilwright.web.RecordBinder;
import coilwright.web.units.Fmt;
import coilwright.web.units.Quantity;
import coilwright.web.units.Units;
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
    /** Hydro: the flow-duration curve as "flow@percent" pairs, the flow in the form's flow unit. */
    static final String FLOW_DURATION = "flowDuration";
    private static final Pattern PAIR = Pattern.compile("\\s*([^@\\s]+)\\s*@\\s*([^@\\s]+)\\s*");
    private static final Pattern LIST_SEPARATOR = Pattern.compile("[,;\\s]+");
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** How a field is shown and converted at the edge, in SI and in imperial units. */
    enum Unit {
        NONE("", "", 1, null),
        WHOLE("", "", 0, null),
        TEXT("", "", -1, null),
        METRE("m", "ft", 1, Quantity.LENGTH),
        MM("mm", "in", 1e-3, Quantity.SMALL_LENGTH),
        MM2("mm²", "mm²", 1e-6, null),
        SPEED("m/s", "mph", 1, Quantity.SPEED),
        LITRE_PER_S("L/s", "US gpm", 1e-3, Quantity.FLOW),
        CELSIUS("°C", "°F", 1, Quantity.TEMPERATURE),
        PERCENT("%", "%", 0.01, null),
        PER_KG("per kg", "per lb", 1, Quantity.MASS),
        A_PER_MM2("A/mm²", "A/mm²", 1, null),
        VOLT("V", "V", 1, null),
        RPM("rpm", "rpm", 1, null);

        private final String si;
        private final String imperial;
        /** SI per shown SI unit: 0 for whole numbers, -1 for text. */
        final double toSi;
        private final Quantity quantity;

        Unit(String si, String imperial, double toSi, Quantity quantity) {
            this.si = si;
            this.imperial = imperial;
            this.toSi = toSi;
            this.quantity = quantity;
        }

        String symbol(Units units) {
            return units == Units.IMPERIAL ? imperial : si;
        }

        /** A typed number to the request's SI value (NIST SP 811 factors in {@link Quantity}). */
        double toSi(double typed, Units units) {
            if (units != Units.IMPERIAL || quantity == null) {
                return typed * toSi;
            }
            return switch (quantity) {
                case FLOW -> quantity.fromImperial(typed);
                case MASS -> typed / quantity.fromImperial(1);
                default -> quantity.fromImperial(typed) * toSi;
            };
        }

        /** The request's SI value as typed in these units. */
        double fromSi(double si, Units units) {
            if (units != Units.IMPERIAL || quantity == null) {
                return si / toSi;
            }
            return switch (quantity) {
                case FLOW -> quantity.toImperial(si);
                case MASS -> si * quantity.fromImperial(1);
                default -> quantity.toImperial(si / toSi);
            };
        }

        boolean converts() {
            return quantity != null && !si.equals(imperial);
        }
    }

    /**
     * A form field: its request path and unit; an optional one left blank (or 0) leaves the request field out.
     */
    private record Field(String name, String path, Unit unit, boolean optional) {
        Field(String name, String path, Unit unit) {
            this(name, path, unit, false);
        }

        double toSi() {
            return unit.toSi;
        }
    }

    private static final List<Field> WIND = List.of(
            new Field("rotorDiameterM", "drive.rotor.diameterM", Unit.METRE),
            new Field("furlingRpm", "drive.rotor.maxRotorSpeedRpm", Unit.RPM),
            new Field("meanWindMs", "drive.wind.meanWindSpeedMs", Unit.SPEED),
            new Field("ratedWindMs", "drive.ratedWindSpeedMs", Unit.SPEED),
            new Field("cutInWindMs", "limits.maxCutInWindSpeedMs", Unit.SPEED));
    private static final List<Field> HYDRO = List.of(
            new Field("headM", "drive.site.grossHeadM", Unit.METRE),
            new Field("flowLps", "drive.site.designFlowM3s", Unit.LITRE_PER_S),
            new Field("penstockLengthM", "drive.penstock.lengthM", Unit.METRE),
            new Field("penstockDiameterMm", "drive.penstock.innerDiameterM", Unit.MM),
            new Field("runnerRpm", "drive.runner.targetSpeedRpm", Unit.RPM),
            new Field("driveRatio", "drive.driveRatio", Unit.NONE),
            new Field(FLOW_DURATION, "drive.site.flowDuration", Unit.LITRE_PER_S, true));
    private static final List<Field> AXIAL = List.of(
            new Field("discDiameterMm", "build.discDiametersM", Unit.MM),
            new Field("coilThicknessMm", "build.coilLayerThicknessesM", Unit.MM));
    private static final List<Field> RADIAL = List.of(
            new Field("boreMm", "build.gapDiameterM", Unit.MM),
            new Field("stackMm", "build.stackLengthM", Unit.MM),
            new Field("slots", "build.slots", Unit.WHOLE),
            new Field("slotDepthMm", "build.stator.slotDepthM", Unit.MM),
            new Field("slotWidthMm", "build.stator.slotWidthM", Unit.MM));
    private static final List<Field> COMMON = List.of(
            new Field("cableLengthM", "load.acCable.lengthM", Unit.METRE),
            new Field("cableAreaMm2", "load.acCable.conductorAreaM2", Unit.MM2),
            new Field("minPoles", "build.minPoles", Unit.WHOLE),
            new Field("maxPoles", "build.maxPoles", Unit.WHOLE),
            new Field("magnetGrade", "build.magnets[0].gradeName", Unit.TEXT),
            new Field("magnetWidthMm", "build.magnets[0].widthM", Unit.MM),
            new Field("magnetLengthMm", "build.magnets[0].lengthM", Unit.MM),
            new Field("magnetThicknessMm", "build.magnets[0].thicknessM", Unit.MM),
            new Field("minTurns", "winding.minTurnsPerCoil", Unit.WHOLE),
            new Field("maxTurns", "winding.maxTurnsPerCoil", Unit.WHOLE),
            new Field("thickestAwg", "winding.wire.thickestAwg", Unit.WHOLE),
            new Field("thinnestAwg", "winding.wire.thinnestAwg", Unit.WHOLE),
            new Field("maxStrands", "winding.wire.maxStrands", Unit.WHOLE),
            new Field("maxCurrentDensity", "limits.maxCurrentDensityAPerMm2", Unit.A_PER_MM2),
            new Field("maxWindingTempC", "limits.maxWindingTempC", Unit.CELSIUS, true),
            new Field("maxCoggingPct", "limits.maxCoggingPercent", Unit.NONE, true),
            new Field("minEfficiencyPct", "limits.minEfficiency", Unit.PERCENT),
            new Field("maxOpenCircuitV", "limits.maxOpenCircuitLineRmsV", Unit.VOLT),
            new Field("objective", "objective", Unit.TEXT),
            new Field("copperPrice", "prices.copperPerKg", Unit.PER_KG),
            new Field("magnetPrice", "prices.rareEarthMagnetPerKg", Unit.PER_KG));
    private static final List<List<Field>> GROUPS = List.of(WIND, HYDRO, AXIAL, RADIAL, COMMON);

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
        v.put(FLOW_DURATION, "30@0, 15@30, 10@60, 6@90, 4@100");
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
        v.put("maxWindingTempC", "");
        v.put("maxCoggingPct", "");
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

    /** The unit shown beside each field, in the units chosen. */
    static Map<String, String> symbols(Units units) {
        Map<String, String> out = new LinkedHashMap<>();
        for (List<Field> group : GROUPS) {
            group.forEach(f -> out.put(f.name(), f.unit().symbol(units)));
        }
        out.put("batteryV", "V");
        out.put("thickestAwg", "AWG");
        out.put("thinnestAwg", "AWG");
        out.put("maxCoggingPct", "%");
        return out;
    }

    /**
     * Typed values shown in {@code to}: every readable number of a field whose unit differs between the systems is
     * converted from {@code from}; anything else stays as typed (the binder then names it).
     */
    static Map<String, String> convert(Map<String, String> typed, Units from, Units to) {
        Map<String, String> out = new LinkedHashMap<>(typed);
        if (from == to) {
            return out;
        }
        for (List<Field> group : GROUPS) {
            for (Field f : group) {
                String text = out.get(f.name());
                if (text == null || !f.unit().converts()) {
                    continue;
                }
                if (f.name().equals(FLOW_DURATION)) {
                    out.put(f.name(), convertPairs(text, f.unit(), from, to));
                    continue;
                }
                List<String> parts = new ArrayList<>();
                for (String part : LIST_SEPARATOR.split(text.trim())) {
                    try {
                        double v = Double.parseDouble(part);
                        parts.add(v == 0 && f.optional() ? "0"
                                : Fmt.plain(f.unit().fromSi(f.unit().toSi(v, from), to), 5));
                    } catch (NumberFormatException e) {
                        parts = null;
                        break;
                    }
                }
                if (parts != null && !text.isBlank()) {
                    out.put(f.name(), String.join(", ", parts));
                }
            }
        }
        return out;
    }

    /** Flow-duration pairs with each flow converted; the text as typed when a pair cannot be read. */
    private static String convertPairs(String text, Unit unit, Units from, Units to) {
        List<String> out = new ArrayList<>();
        for (String pair : text.split("[,;]")) {
            java.util.regex.Matcher m = PAIR.matcher(pair);
            if (pair.isBlank()) {
                continue;
            }
            try {
                if (!m.matches()) {
                    return text;
                }
                double flow = unit.fromSi(unit.toSi(Double.parseDouble(m.group(1)), from), to);
                out.add(Fmt.plain(flow, 5) + "@" + m.group(2));
            } catch (NumberFormatException e) {
                return text;
            }
        }
        return String.join(", ", out);
    }

    /**
     * The request the form describes, with every figure typed in SI units.
     *
     * @throws InvalidInputException every invalid field, under its request path (see {@link #onForm})
     */
    SizingRequest bind(Map<String, String> typed) {
        return bind(typed, Units.SI);
    }

    /**
     * The request the form describes, typed in {@code units}. The wind table steps by 0.5 m/s, so a rated wind typed
     * in mph is taken at the nearest step ({@link #notes} says so).
     *
     * @throws InvalidInputException every invalid field, under its request path (see {@link #onForm})
     */
    SizingRequest bind(Map<String, String> typed, Units units) {
        boolean wind = !"HYDRO".equals(typed.get(DRIVE));
        boolean axial = !"RADIAL".equals(typed.get(BUILD));
        ObjectNode tree = skeleton(wind, axial, typed);
        List<FieldError> errors = new ArrayList<>();
        List<Field> fields = new ArrayList<>(COMMON);
        fields.addAll(wind ? WIND : HYDRO);
        fields.addAll(axial ? AXIAL : RADIAL);
        for (Field f : fields) {
            put(tree, f, typed.getOrDefault(f.name(), "").trim(), units, errors);
        }
        cells(tree, typed, errors);
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
        try {
            return binder.bind(tree, SizingRequest.class);
        } catch (InvalidInputException e) {
            throw new InvalidInputException(e.errors().stream().map(err -> asTyped(err, typed, units)).toList());
        }
    }

    /** A message about a converted field starts with the value as the user typed it, in the form's unit. */
    private static FieldError asTyped(FieldError e, Map<String, String> typed, Units units) {
        String name = onForm(e.field());
        for (List<Field> group : GROUPS) {
            for (Field f : group) {
                String shown = f.unit().symbol(units);
                boolean differs = f.unit().toSi != 1 && f.unit().toSi > 0 || units == Units.IMPERIAL && f.unit().converts();
                if (f.name().equals(name) && differs && !shown.isEmpty() && !name.equals(FLOW_DURATION)) {
                    return new FieldError(e.field(), e.value(), typed.getOrDefault(name, "") + " " + shown
                            + " is out of range (the request in SI units: " + e.message() + ")", e.allowed());
                }
            }
        }
        return e;
    }

    /** What the page did with the units typed: a rated wind in mph taken at the table's nearest 0.5 m/s step. */
    static List<String> notes(Map<String, String> typed, Units units) {
        if (units != Units.IMPERIAL || "HYDRO".equals(typed.get(DRIVE))) {
            return List.of();
        }
        try {
            double mph = Double.parseDouble(typed.getOrDefault("ratedWindMs", "").trim());
            double ms = ratedWindStep(Unit.SPEED.toSi(mph, units));
            return List.of(String.format(Locale.ROOT, "Rated wind %s mph is taken as %.1f m/s (%s mph), the nearest "
                    + "step of the 0.5 m/s wind table", Fmt.plain(mph, 4), ms, Fmt.plain(Unit.SPEED.fromSi(ms, units), 4)));
        } catch (NumberFormatException e) {
            return List.of();
        }
    }

    private static double ratedWindStep(double ms) {
        return Math.round(ms / WindMatchRequest.WIND_STEP_MS) * WindMatchRequest.WIND_STEP_MS;
    }

    /** The form field that shows a message about a request path; the path itself when no field shows it. */
    static String onForm(String path) {
        for (List<Field> group : GROUPS) {
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

    private static void put(ObjectNode tree, Field f, String text, Units units, List<FieldError> errors) {
        if (f.name().equals(FLOW_DURATION) && text.isEmpty()) {
            ((ObjectNode) tree.at("/drive/site")).putArray("flowDuration");
            return;
        }
        if (f.optional() && (text.isEmpty() || text.matches("0+(\\.0*)?"))) {
            return;
        }
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
        if (f.name().equals(FLOW_DURATION)) {
            pairs(parent.putArray(leaf), f, text, units, errors);
            return;
        }
        try {
            if (list) {
                ArrayNode values = parent.putArray(leaf);
                for (String part : LIST_SEPARATOR.split(text)) {
                    values.add(f.unit().toSi(Double.parseDouble(part), units));
                }
            } else if (f.toSi() == 0) {
                parent.put(leaf, Integer.parseInt(text));
            } else {
                double si = f.unit().toSi(Double.parseDouble(text), units);
                boolean snap = units == Units.IMPERIAL && f.name().equals("ratedWindMs") && Double.isFinite(si);
                parent.put(leaf, snap ? ratedWindStep(si) : si);
            }
        } catch (NumberFormatException e) {
            errors.add(new FieldError(f.name(), text, f.name() + " = " + text + ": must be "
                    + (f.toSi() == 0 ? "a whole number" : list ? "numbers separated by commas" : "a number"),
                    f.toSi() == 0 ? "whole numbers" : "numbers"));
        }
    }

    /** "flow@percent" pairs, separated by commas or semicolons, to the request's flow-duration points. */
    private static void pairs(ArrayNode points, Field f, String text, Units units, List<FieldError> errors) {
        for (String pair : text.split("[,;]")) {
            if (pair.isBlank()) {
                continue;
            }
            java.util.regex.Matcher m = PAIR.matcher(pair);
            try {
                if (!m.matches()) {
                    throw new NumberFormatException(pair);
                }
                points.addObject().put("flowM3s", f.unit().toSi(Double.parseDouble(m.group(1)), units))
                        .put("percentOfTime", Double.parseDouble(m.group(2)));
            } catch (NumberFormatException e) {
                errors.add(new FieldError(f.name(), text, f.name() + " = " + text + ": must be pairs of flow@percent "
                        + "of the year, separated by commas, e.g. 30@0, 15@30, 10@60, 6@90, 4@100",
                        "flow@percent pairs, percent 0 to 100 increasing"));
                return;
            }
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
            drive.putObject("site");
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
