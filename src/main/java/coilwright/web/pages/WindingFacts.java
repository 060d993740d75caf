package coilwright.web.pages;

import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.SvgCharts;
import coilwright.winding.HarmonicFactor;
import coilwright.winding.Winding;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The figures of a winding in words, and its winding factors as a bar chart and a table. */
final class WindingFacts {
    /**
     * A figure of the winding.
     *
     * @param key   a stable name for tests and styles
     * @param label the figure in words
     * @param value its value
     * @param note  what it means, with the usual symbol
     */
    public record Fact(String key, String label, String value, String note) {
    }

    /** Winding factors with the harmonic orders across: one row per factor. */
    public record FactorTable(List<String> orders, List<List<String>> rows) {
    }

    private WindingFacts() {
    }

    static List<Fact> headline(Winding w, int sections) {
        int pull = w.gcdSlotsPoles();
        String q = w.qDenominator() == 1 ? Integer.toString(w.qNumerator()) : w.qNumerator() + "/" + w.qDenominator();
        return List.of(
                new Fact("fundamental", "Winding factor (fundamental)", WindingView.f("%.4f", w.fundamentalWindingFactor()),
                        "The share of each turn's EMF that adds up in the phase (kw1): distribution and pitch together."),
                new Fact("q", "Slots per pole per phase", q, "q = Q/(2pm). Below 1 each coil is wound round one tooth; "
                        + "a whole number gives a distributed winding with full-pitch coils possible."),
                new Fact("sections", "Repeating sections around the stator", Integer.toString(sections),
                        "The coil pattern repeats this many times; for a double layer it is t = gcd(Q, p). Identical "
                                + "sections are what allow a phase to be split into parallel paths."),
                new Fact("cogging", "Cogging cycles per revolution", Integer.toString(w.lcmSlotsPoles()),
                        "LCM(Q, 2p): the more cycles, the smaller the cogging torque usually is. Skewing by one cycle, "
                                + WindingView.f("%.2f", 360.0 / w.lcmSlotsPoles()) + "° of the rotor, cancels most of it."),
                new Fact("pull", "Magnetic pull round the gap", pull == 1 ? "one-sided" : "balanced, " + pull + "-fold",
                        "gcd(Q, 2p) = " + pull + ": with 1 the slot forces on the rotor do not cancel and the bearings "
                                + "carry a rotating side pull."),
                new Fact("coils", "Coils", w.coils().size() + " (" + w.coilsPerPhase() + " per phase, "
                        + w.coilsPerPathPerPhase() + " in series per path)", "Q for a double layer, Q/2 for a single layer."),
                new Fact("pitch", "Coil pitch", w.coilPitchSlots() + (w.coilPitchSlots() == 1 ? " slot" : " slots"),
                        "The slots a coil spans, y; a slot is " + WindingView.f("%.1f", w.slotAngleElecDeg())
                                + " electrical degrees (360p/Q)."));
    }

    static String factorChart(Winding w) {
        List<String> orders = new ArrayList<>();
        double[] kw = new double[w.windingFactors().size()];
        double[] total = new double[kw.length];
        for (int i = 0; i < kw.length; i++) {
            HarmonicFactor h = w.windingFactors().get(i);
            orders.add(Integer.toString(h.order()));
            kw[i] = h.windingFactor();
            total[i] = h.totalFactor();
        }
        Map<String, double[]> series = new LinkedHashMap<>();
        series.put("Winding factor", kw);
        if (w.spec().skewSlotPitches() > 0) {
            series.put("With the skew", total);
        }
        return SvgCharts.barChart("Winding factor by harmonic order", new ChartSpec.Axis("Harmonic order", ""),
                new ChartSpec.Axis("Factor", ""), orders, series, 0, 1, 560, 300);
    }

    static FactorTable factorTable(Winding w) {
        List<String> orders = new ArrayList<>();
        List<String> kw = new ArrayList<>(List.of("Winding factor (distribution × pitch)"));
        List<String> ks = new ArrayList<>(List.of("Skew factor"));
        List<String> both = new ArrayList<>(List.of("Both together"));
        for (HarmonicFactor h : w.windingFactors()) {
            orders.add(Integer.toString(h.order()));
            kw.add(WindingView.f("%.4f", h.windingFactor()));
            ks.add(WindingView.f("%.4f", h.skewFactor()));
            both.add(WindingView.f("%.4f", h.totalFactor()));
        }
        return new FactorTable(orders, List.of(kw, ks, both));
    }
}
