package coilwright.web.pages;

import coilwright.winding.Coil;
import coilwright.winding.HarmonicFactor;
import coilwright.winding.Winding;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A winding as a rewinder reads it: the diagram, the facts (q, periodicity, cogging periods), the winding
 * factors of orders 1..13, the coil list and each phase's coils in connection order.
 *
 * @param diagram     inline SVG ({@link WindingDiagram})
 * @param facts       label and value pairs
 * @param factors     per harmonic: order, kw, skew factor, total (formatted)
 * @param coils       per coil: number, go slot, return slot, phase, polarity
 * @param phaseOrder  per phase: its letter, its colour and, per parallel path, the coils in series ("1, −4, 7")
 */
public record WindingView(String diagram, List<List<String>> facts, List<List<String>> factors, List<List<String>> coils,
                   List<PhaseOrder> phaseOrder) {

    /** One phase's coils in connection order, per parallel path. */
    public record PhaseOrder(String phase, String colour, List<String> paths) {
    }

    static WindingView of(Winding w) {
        List<List<String>> facts = List.of(
                List.of("Slots per pole per phase q", w.qDenominator() == 1 ? Integer.toString(w.qNumerator())
                        : w.qNumerator() + "/" + w.qDenominator()),
                List.of("Coils", Integer.toString(w.coils().size())),
                List.of("Coils per phase", Integer.toString(w.coilsPerPhase())),
                List.of("Coils in series per parallel path", Integer.toString(w.coilsPerPathPerPhase())),
                List.of("Coil pitch (slots)", Integer.toString(w.coilPitchSlots())),
                List.of("Slot pitch (electrical degrees)", f("%.2f", w.slotAngleElecDeg())),
                List.of("Periodicity t = gcd(Q, p)", Integer.toString(w.periodicity())),
                List.of("Cogging periods per revolution, LCM(Q, 2p)", Integer.toString(w.lcmSlotsPoles())),
                List.of("gcd(Q, 2p)", Integer.toString(w.gcdSlotsPoles())));
        List<List<String>> factors = new ArrayList<>();
        for (HarmonicFactor h : w.windingFactors()) {
            factors.add(List.of(Integer.toString(h.order()), f("%.4f", h.windingFactor()), f("%.4f", h.skewFactor()),
                    f("%.4f", h.totalFactor())));
        }
        List<List<String>> coils = new ArrayList<>();
        for (Coil c : w.coils()) {
            coils.add(List.of(Integer.toString(c.number()), Integer.toString(c.goSlot()), Integer.toString(c.returnSlot()),
                    c.phaseName(), c.polarity() > 0 ? "forward" : "reversed"));
        }
        List<PhaseOrder> order = new ArrayList<>();
        for (int ph = 0; ph < w.spec().phases(); ph++) {
            List<String> paths = new ArrayList<>();
            for (List<Integer> path : w.parallelPathCoils().get(ph)) {
                paths.add(String.join(", ", path.stream().map(n -> (w.coil(n).polarity() < 0 ? "−" : "") + n).toList()));
            }
            order.add(new PhaseOrder(Winding.phaseName(ph), WindingDiagram.PHASE_COLOURS.get(ph), paths));
        }
        return new WindingView(WindingDiagram.svg(w), facts, factors, coils, order);
    }

    private static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }
}
