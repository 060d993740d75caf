package coilwright.web.pages;

import coilwright.web.winding.PhaseColours;
import coilwright.web.winding.RingDiagram;
import coilwright.web.winding.UnrolledWinding;
import coilwright.winding.Coil;
import coilwright.winding.Layers;
import coilwright.winding.Winding;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A winding as a rewinder reads it: the unrolled drawing first, the figures that decide the choice of slots and
 * poles in words, the winding factors as bars (the numbers behind a disclosure), each phase's coils in connection
 * order, the coil list and the ring seen from the connection end.
 *
 * @param developments the unrolled drawings (one for every screen, or one wide and one narrow)
 * @param phases       the phase letters, A first
 * @param twoLayers    two coil sides per slot
 * @param facts        the headline figures, named in words
 * @param factorChart  inline SVG: winding factor by harmonic order
 * @param factorTable  the numbers behind the chart (orders across)
 * @param coils        per coil: number, start slot, return slot, phase, connection
 * @param phaseOrder   per phase: its letter, its swatch class and, per parallel path, the coils in series ("1, −4, 7")
 * @param ring         inline SVG of the ring seen from the connection end ({@link RingDiagram})
 * @param spec         the winding's query for {@link WindingPage} (slots=..&amp;poles=..), so a page can show the
 *                     drawings as images of their own address instead of inline
 */
public record WindingView(List<UnrolledWinding> developments, List<String> phases, boolean twoLayers,
                          List<WindingFacts.Fact> facts, String factorChart, WindingFacts.FactorTable factorTable,
                          List<List<String>> coils, List<PhaseOrder> phaseOrder, String ring, String spec) {

    /** One phase's coils in connection order, per parallel path. */
    public record PhaseOrder(String phase, String swatch, List<String> paths) {
    }

    static WindingView of(Winding w) {
        List<UnrolledWinding> developments = UnrolledWinding.forPage(w);
        List<List<String>> coils = new ArrayList<>();
        for (Coil c : w.coils()) {
            coils.add(List.of(Integer.toString(c.number()), Integer.toString(c.goSlot()), Integer.toString(c.returnSlot()),
                    c.phaseName(), c.polarity() > 0 ? "forward" : "reversed"));
        }
        List<PhaseOrder> order = new ArrayList<>();
        List<String> phases = new ArrayList<>();
        for (int ph = 0; ph < w.spec().phases(); ph++) {
            List<String> paths = new ArrayList<>();
            for (List<Integer> path : w.parallelPathCoils().get(ph)) {
                paths.add(String.join(", ", path.stream().map(n -> (w.coil(n).polarity() < 0 ? "−" : "") + n).toList()));
            }
            String letter = Winding.phaseName(ph);
            phases.add(letter);
            order.add(new PhaseOrder(letter, PhaseColours.cssClass(letter), paths));
        }
        return new WindingView(developments, phases, w.spec().layers() == Layers.DOUBLE,
                WindingFacts.headline(w, developments.get(0).sections()), WindingFacts.factorChart(w),
                WindingFacts.factorTable(w), coils, order, RingDiagram.svg(w), WindingPage.query(w.spec()));
    }

    /** The address of one drawing as an SVG image: a development's variant ({@code wide}, ...) or {@code ring}. */
    public String drawing(String view) {
        return WindingPage.DRAWING + "?" + spec + "&view=" + view;
    }

    static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }
}
