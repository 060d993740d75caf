package coilwright.web.rewind;

import coilwright.conductor.WireGauge;
import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;
import coilwright.rewind.ExistingMachine;
import coilwright.rewind.MachineCharacterisation;
import coilwright.rewind.PoleOption;
import coilwright.rewind.Reconnection;
import coilwright.rewind.RewindOption;
import coilwright.rewind.RewindPlan;
import coilwright.rewind.RewindTarget;
import coilwright.rewind.WireChoice;
import coilwright.web.pages.DesignEdit;
import coilwright.winding.Layers;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/**
 * Links from a rewind option to the design form ({@code GET /design/new}) with its values pre-filled as query
 * parameters named by the dotted paths of {@code EvaluationRequest}, in the form's SI units ({@code enteredIn=si}: mm,
 * mH, °C). The measured Ke (scaled to the option) goes in {@code alternator.measuredKeLineVPerRpm}, so the evaluation
 * uses it in place of a computed EMF; the machine's dimensions are not known here, so {@link MachineGuess} opens it as
 * the right kind of machine with magnets that fit and the mean turn the measured resistance implies.
 */
public final class DesignLinks {
    /** The design form. */
    public static final String DESIGN_FORM = "/design/new";
    /** Highest measured Ke the design input accepts, V/rpm (AlternatorSpec.measuredKeLineVPerRpm). */
    static final double MAX_MEASURED_KE = 100.0;

    private final ExistingMachine machine;
    private final RewindPlan plan;
    private final boolean slotted;

    /**
     * @param slotted the coils sit in the slots of an iron stator (a radial machine), else they are air-cored coils
     *                of an axial machine
     */
    DesignLinks(ExistingMachine machine, RewindPlan plan, boolean slotted) {
        this.machine = machine;
        this.plan = plan;
        this.slotted = slotted;
    }

    /** The machine reconnected as the option says, with its present turns and wire. */
    public String reconnection(Reconnection r) {
        return link(winding(r.parallelPaths(), machine.turnsPerCoil(), r.connection(), machine.wire(),
                r.keLineRmsVPerRpm(), seriesTurns(machine.turnsPerCoil(), r.parallelPaths())));
    }

    /** The machine rewound with the option's turns and the chosen wire. */
    public String rewind(RewindOption o, WireChoice w) {
        return link(winding(o.parallelPaths(), o.turnsPerCoil(), o.connection(), w.wire(), o.keLineRmsVPerRpm(),
                o.seriesTurnsPerPhase()));
    }

    /** A bare stator wound for one pole count (turns, wire and rotor to be chosen on the form). */
    public static String statorOption(int slots, int phases, Layers layers, PoleOption o) {
        Map<String, String> p = new LinkedHashMap<>();
        putWinding(p, slots, o.poles(), phases, layers, o.coilPitchSlots(), 1);
        return link(p);
    }

    private Map<String, String> winding(int paths, int turns, Connection conn, WireSpec wire, double keLine,
                                        int seriesTurnsPerPhase) {
        MachineCharacterisation ch = plan.characterisation();
        RewindTarget t = plan.target();
        Map<String, String> p = new LinkedHashMap<>();
        p.put(DesignEdit.ENTERED_IN, "si");
        putWinding(p, machine.slots(), ch.poles(), machine.phases(), machine.layers(), ch.coilPitchSlots(), paths);
        OptionalDouble meanTurnM = ch.meanTurnLengthM().map(b -> OptionalDouble.of(b.value())).orElse(OptionalDouble.empty());
        if (slotted) {
            MachineGuess.radial(p, machine.slots(), ch.coilPitchSlots(), meanTurnM, machine.layers(),
                    turns * wire.strandsInHand() * wire.overallDiameterM() * wire.overallDiameterM());
        } else {
            MachineGuess.axial(p, machine.slots(), machine.layers(), ch.poles(), meanTurnM);
        }
        p.put("alternator.turnsPerCoil", Integer.toString(turns));
        p.put("alternator.connection", conn.name());
        p.put("alternator.wire.gauge", wire.gauge().name());
        p.put("alternator.wire.awg", Integer.toString(wire.awg()));
        p.put("alternator.wire.bareDiameterM", wire.gauge() == WireGauge.METRIC ? num(1000 * wire.bareDiameterM()) : "0");
        p.put("alternator.wire.insulationGrade", Integer.toString(wire.insulationGrade()));
        p.put("alternator.wire.strandsInHand", Integer.toString(wire.strandsInHand()));
        if (keLine <= MAX_MEASURED_KE) {
            p.put("alternator.measuredKeLineVPerRpm", num(keLine));
        }
        ch.phaseInductanceH().ifPresent(l -> {
            double ratio = (double) seriesTurnsPerPhase / ch.seriesTurnsPerPhase();
            p.put("alternator.phaseInductanceH", num(1000 * l.value() * ratio * ratio));
        });
        p.put("alternator.windingTempC", num(t.windingTemperatureC()));
        p.put("ratedSpeedRpm", num(t.targetSpeedRpm()));
        if (t.kind() == RewindTarget.Kind.BATTERY_CUT_IN) {
            p.put("load.type", "BatteryLoad");
            p.put("load.battery.chemistry", "CUSTOM");
            p.put("load.battery.cells", "1");
            p.put("load.battery.customVoltageV", num(t.batteryVoltageV()));
            p.put("load.battery.stage", "NOMINAL");
            p.put("load.rectifier.type", machine.phases() == 3 ? "THREE_PHASE_BRIDGE" : "SINGLE_PHASE_BRIDGE");
            p.put("load.rectifier.forwardDropV", num(t.diodeDropV()));
        }
        return p;
    }

    private int seriesTurns(int turns, int paths) {
        return plan.characterisation().coilsPerPhase() * turns / paths;
    }

    private static void putWinding(Map<String, String> p, int slots, int poles, int phases, Layers layers, int pitch,
                                   int paths) {
        p.put("alternator.winding.slots", Integer.toString(slots));
        p.put("alternator.winding.poles", Integer.toString(poles));
        p.put("alternator.winding.phases", Integer.toString(phases));
        p.put("alternator.winding.layers", layers.name());
        p.put("alternator.winding.coilPitchSlots", Integer.toString(pitch));
        p.put("alternator.winding.parallelPaths", Integer.toString(paths));
        p.put("alternator.winding.skewSlotPitches", "0");
    }

    private static String link(Map<String, String> params) {
        return DESIGN_FORM + "?" + params.entrySet().stream()
                .map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    /** Shortest text that reads back as the same double. */
    private static String num(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
