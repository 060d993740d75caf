package coilwright.web.pages;

import coilwright.conductor.WireGauge;
import coilwright.machine.Alternator;
import coilwright.machine.Connection;
import coilwright.rewind.Terminals;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.web.Words;
import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The bench sheet of a design ({@code GET /design/bench?design=}): what a rewinder builds and checks on the bench on
 * one printed page. What to wind (coils, turns, wire, strands in hand), how to connect it (coils of each phase in
 * order, the unrolled layout, the star or delta leads) and what to measure: the cold resistance per phase and
 * between line leads at 20 °C, and the open-circuit line voltage at a stated test speed.
 */
final class BenchSheet {
    private BenchSheet() {
    }

    static Map<String, Object> of(String title, EvaluationRequest request, AlternatorEvaluation e, double testRpm,
                                  Units units) {
        Alternator a = e.alternator();
        var spec = a.spec();
        var w = a.winding();
        Fmt fmt = new Fmt(units);
        int phases = spec.winding().phases();
        double rPhase = a.resistance().resistance20COhm();
        double rLine = rPhase * Terminals.lineResistanceFactor(phases, spec.connection());
        String wire = spec.wire().gauge() == WireGauge.AWG
                ? "AWG " + spec.wire().awg() + " (" + fmt.small(spec.wire().bareDiameterM()) + " bare)"
                : fmt.small(spec.wire().bareDiameterM()) + " bare";
        List<List<String>> build = List.of(
                List.of("Slots (coil positions)", Integer.toString(spec.winding().slots())),
                List.of("Magnet poles", Integer.toString(spec.winding().poles())),
                List.of("Phases", Integer.toString(phases)),
                List.of("Coil sides per slot", Words.of(spec.winding().layers())),
                List.of("Coil pitch", w.coilPitchSlots() + (w.coilPitchSlots() == 1 ? " slot" : " slots")),
                List.of("Coils", Integer.toString(w.coils().size())),
                List.of("Coils per phase", Integer.toString(w.coilsPerPhase())),
                List.of("Parallel paths", Integer.toString(spec.winding().parallelPaths())),
                List.of("Turns per coil", Integer.toString(spec.turnsPerCoil())),
                List.of("Series turns per phase", Integer.toString(a.seriesTurnsPerPhase())),
                List.of("Wire", wire + ", insulation grade " + spec.wire().insulationGrade()),
                List.of("Strands in hand", Integer.toString(spec.wire().strandsInHand())),
                List.of("Connection", Words.of(spec.connection())));
        List<List<String>> check = List.of(
                List.of("Resistance of one phase at 20 °C", fmt.sig(rPhase, 3) + " Ω"),
                List.of("Resistance between two line leads at 20 °C", fmt.sig(rLine, 3) + " Ω"),
                List.of("Test speed", Fmt.plain(testRpm, 4) + " rpm (" + fmt.sig(a.frequencyHz(testRpm), 3) + " Hz)"),
                List.of("Open-circuit line voltage at the test speed", fmt.sig(a.emfLineRmsV(testRpm), 3) + " V rms ("
                        + fmt.sig(Math.sqrt(2) * a.emfLineRmsV(testRpm), 3) + " V peak)"),
                List.of("Open-circuit line voltage per 100 rpm", fmt.sig(100 * a.keLineRmsVPerRpm(), 3) + " V rms"),
                List.of("Mean turn length", fmt.small(a.meanTurnLengthM())),
                List.of("Copper mass", fmt.shown(Shown.KILOGRAM, a.copperMassKg(), 3)));
        Map<String, Object> m = new HashMap<>();
        m.put("heading", title);
        m.put("build", build);
        m.put("check", check);
        m.put("leads", leads(spec.connection(), phases));
        m.put("sketch", phases == 1 ? "single" : spec.connection() == Connection.STAR ? "star" : "delta");
        m.put("winding", WindingView.of(w));
        m.put("testRpm", Fmt.plain(testRpm, 4));
        return m;
    }

    /** How the phase ends become the line leads, in words (common practice). */
    private static String leads(Connection c, int phases) {
        if (phases == 1) {
            return "Single phase: the start of the first coil and the finish of the last are the two leads.";
        }
        return c == Connection.STAR
                ? "Star (Y): join the finishes of phases A, B and C in one star point and insulate it; the three starts "
                + "are the line leads. Measure resistance between two starts: it is two phases in series."
                : "Delta: join the finish of A to the start of B, the finish of B to the start of C and the finish of C "
                + "to the start of A; the three joints are the line leads. Measure between two joints: one phase in "
                + "parallel with the other two in series.";
    }
}
