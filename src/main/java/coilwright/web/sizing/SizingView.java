package coilwright.web.sizing;

import coilwright.service.DesignDocument;
import coilwright.sizing.DesignFigures;
import coilwright.sizing.NearMiss;
import coilwright.sizing.SizedDesign;
import coilwright.sizing.SizingRequest;
import coilwright.sizing.SizingResult;
import coilwright.system.EvaluationRequest;
import coilwright.web.Json;
import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.Series;
import coilwright.web.charts.SvgCharts;
import coilwright.web.pages.DesignFormValues;
import coilwright.web.units.Quantity;
import coilwright.web.units.Units;

import com.fasterxml.jackson.core.JsonProcessingException;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

/** The results half of the sizing page: ranked designs, each ready to open on the design pages, the Pareto chart, near misses. */
final class SizingView {
    private SizingView() {
    }

    /**
     * One ranked design as the table shows it; {@code sort} holds the raw number of each sortable column and
     * {@code design} the design form's fields of this design (posted to the design results, or put in the form),
     * {@code document} the design document to save it under a permanent link.
     */
    record Row(int rank, String layout, int coils, int poles, int turns, String wire, String connection,
               String cutIn, String cutInWind, String ratedPower, String efficiency, String currentDensity,
               String openCircuit, String mass, String cost, String energy, String hotSpot, String cogging,
               Map<String, String> sort,
               Map<String, String> design, String editLink, String document) {
    }

    /** A near miss in words. */
    record Miss(String limit, String message) {
    }

    static Map<String, Object> of(SizingRequest request, SizingResult result, Units units) {
        Map<String, Object> m = new HashMap<>();
        m.put("rows", result.designs().stream().map(d -> row(request, d, units)).toList());
        m.put("result", result);
        m.put("counts", result.counts());
        m.put("nearMisses", result.nearMisses().stream().map(n -> new Miss(n.limit(), sentence(n))).toList());
        m.put("paretoChart", paretoChart(result));
        m.put("hasEnergy", result.designs().stream().anyMatch(d -> d.figures().annualEnergyKWh().isPresent()));
        return m;
    }

    private static String sentence(NearMiss n) {
        String s = n.message();
        return Character.toUpperCase(s.charAt(0)) + s.substring(1) + ".";
    }

    private static Row row(SizingRequest request, SizedDesign d, Units units) {
        DesignFigures f = d.figures();
        EvaluationRequest design = request.evaluationRequest(d.alternator(), f.ratedSpeedRpm(), f.maxSpeedRpm());
        Map<String, String> fields = new TreeMap<>(DesignFormValues.of(design, units));
        String edit = "/design/new?" + fields.entrySet().stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue()))
                .collect(Collectors.joining("&"));
        Map<String, String> sort = new HashMap<>();
        sort.put("rank", Integer.toString(d.rank()));
        sort.put("cutIn", num(f.cutInSpeedRpm()));
        sort.put("ratedPower", num(f.ratedPowerW()));
        sort.put("efficiency", num(f.ratedEfficiency()));
        sort.put("currentDensity", num(f.ratedCurrentDensityAPerMm2()));
        sort.put("openCircuit", num(f.openCircuitLineRmsV()));
        sort.put("mass", num(f.activeMassKg()));
        sort.put("cost", num(f.materialCost()));
        sort.put("energy", num(f.annualEnergyKWh().orElse(0)));
        sort.put("turns", Integer.toString(d.alternator().turnsPerCoil()));
        sort.put("hotSpot", num(f.ratedWindingHotSpotC().orElse(0)));
        sort.put("cogging", num(f.coggingPercentOfRatedTorque().orElse(0)));
        return new Row(d.rank(), d.layout(), d.alternator().winding().slots(), d.alternator().winding().poles(),
                d.alternator().turnsPerCoil(), d.alternator().wire().label(),
                d.alternator().connection().name().toLowerCase(Locale.ROOT),
                String.format(Locale.ROOT, "%.0f rpm", f.cutInSpeedRpm()),
                f.cutInWindSpeedMs().isPresent() ? String.format(Locale.ROOT, "%.1f %s",
                        units.show(Quantity.SPEED, f.cutInWindSpeedMs().getAsDouble()), units.symbol(Quantity.SPEED)) : "",
                String.format(Locale.ROOT, "%.0f W", f.ratedPowerW()),
                String.format(Locale.ROOT, "%.1f %%", 100 * f.ratedEfficiency()),
                String.format(Locale.ROOT, "%.2f A/mm²", f.ratedCurrentDensityAPerMm2()),
                String.format(Locale.ROOT, "%.0f V", f.openCircuitLineRmsV()),
                String.format(Locale.ROOT, "%.2f %s", units.show(Quantity.MASS, f.activeMassKg()),
                        units.symbol(Quantity.MASS)),
                String.format(Locale.ROOT, "%.0f", f.materialCost()),
                f.annualEnergyKWh().isPresent() ? String.format(Locale.ROOT, "%.0f kWh", f.annualEnergyKWh().getAsDouble()) : "",
                f.ratedWindingHotSpotC().isPresent() ? String.format(Locale.ROOT, "%.0f %s",
                        units.show(Quantity.TEMPERATURE, f.ratedWindingHotSpotC().getAsDouble()),
                        units.symbol(Quantity.TEMPERATURE)) : "",
                f.ratedWindingHotSpotC().isEmpty() ? "" : f.coggingPeakNm() == 0 ? "none" : f.coggingPercentOfRatedTorque().isPresent()
                        ? String.format(Locale.ROOT, "%.1f %% (%.2f %s)", f.coggingPercentOfRatedTorque().getAsDouble(),
                        units.show(Quantity.TORQUE, f.coggingPeakNm()), units.symbol(Quantity.TORQUE))
                        : String.format(Locale.ROOT, "%.2f %s", units.show(Quantity.TORQUE, f.coggingPeakNm()),
                        units.symbol(Quantity.TORQUE)),
                sort, fields, edit, document(d, design));
    }

    private static String document(SizedDesign d, EvaluationRequest design) {
        String title = String.format(Locale.ROOT, "Sized design %d: %d coils / %d poles, %d turns of %s, %s", d.rank(),
                d.alternator().winding().slots(), d.alternator().winding().poles(), d.alternator().turnsPerCoil(),
                d.alternator().wire().label(), d.alternator().connection().name().toLowerCase(Locale.ROOT));
        try {
            return Json.mapper().writeValueAsString(new DesignDocument(DesignDocument.SCHEMA_VERSION, title,
                    "From the sizing page: " + d.layout() + ".", design));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a sized design could not be written as JSON", e);
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "0";
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    /** Energy (or output) against cost (or mass) of the front, cheapest first; null when the front is empty. */
    private static String paretoChart(SizingResult r) {
        List<SizedDesign> front = r.paretoFront();
        if (front.isEmpty()) {
            return null;
        }
        boolean energy = r.paretoValue().equals("annualEnergyKWh");
        boolean cost = r.paretoCost().equals("materialCost");
        double[] x = front.stream().mapToDouble(d -> cost ? d.figures().materialCost() : d.figures().activeMassKg()).toArray();
        double[] y = front.stream().mapToDouble(d -> energy ? d.figures().annualEnergyKWh().orElse(0)
                : d.figures().ratedPowerW()).toArray();
        ChartSpec spec = ChartSpec.of("Best " + (energy ? "energy" : "output") + " for the " + (cost ? "cost" : "mass"),
                new ChartSpec.Axis(cost ? "Material cost" : "Copper and magnet mass", cost ? "" : "kg"),
                new ChartSpec.Axis(energy ? "Energy into the battery per year" : "Output at rated", energy ? "kWh" : "W"),
                List.of(new Series("Designs no other beats on both", x, y)));
        return SvgCharts.lineChart(spec);
    }
}
