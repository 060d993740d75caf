package coilwright.rewind;

import coilwright.conductor.BandTemperature;
import coilwright.conductor.Cooling;
import coilwright.conductor.Copper;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * From a measured machine to reconnections and rewinds that meet a new battery cut-in or line voltage.
 *
 * <p>Scaling: the EMF per turn (kw1 Phi1 per rpm) stays the same when the coils are regrouped or rewound on the same
 * stator and rotor, so Ke_LL,new = Ke_LL,old (N_c,new / N_c,old) (a_old / a_new) (c_new / c_old), where N_c is the
 * turns per coil, a the parallel paths and c the line-voltage factor (sqrt(3) star, 1 delta). A rewind keeps the
 * copper area per coil, so the conductor area scales as A_new = A_old N_c,old / N_c,new and the coil keeps its size
 * and mean turn length.
 */
public final class RewindPlanner {
    /** kw3 above which a delta option carries a circulating-current caution. */
    static final double DELTA_KW3_CAUTION = 0.01;
    /** Cooling assumed for the temperature estimate of a rewind: an open, self-ventilated frame, as motors and car
     *  alternators have (its band 4 to 6 A/mm^2, from memory: see {@link Cooling}). */
    public static final Cooling ASSUMED_COOLING = Cooling.OPEN_VENTILATED;
    /** Ambient of the temperature estimate, C. */
    public static final double ASSUMED_AMBIENT_C = AlternatorSpec.DEFAULT_AMBIENT_TEMP_C;
    /** Deviations closer than this count as equal when ranking. */
    static final double RANK_RESOLUTION = 1e-9;

    private RewindPlanner() {
    }

    /**
     * Plans reconnections and rewinds.
     *
     * @param machine what is known of the machine, with measurements
     * @param target  the wanted cut-in or voltage and where to evaluate
     * @return ranked options, closest to the target first
     * @throws coilwright.validation.InvalidInputException as {@link MachineCharacteriser#characterise}, and when
     *         machine or target is missing
     * @throws coilwright.validation.InfeasibleDesignException when the winding cannot be balanced
     */
    public static RewindPlan plan(ExistingMachine machine, RewindTarget target) {
        new coilwright.validation.Checks().present("machine", machine).present("target", target).throwIfAny();
        MachineCharacterisation ch = MachineCharacteriser.characterise(machine);
        double wantedKe = target.wantedKeLineRmsVPerRpm();
        List<Reconnection> reconnections = new ArrayList<>();
        List<RewindOption> rewinds = new ArrayList<>();
        for (Connection conn : connections(machine.phases())) {
            for (int paths : ch.allowedParallelPaths()) {
                reconnections.add(reconnection(machine, ch, target, conn, paths));
                rewinds.addAll(rewinds(machine, ch, target, conn, paths, wantedKe));
            }
        }
        // a closed delta in which the third harmonic circulates heats the winding with no output: every such option
        // ranks behind every star one, however close it comes to the target
        reconnections.sort(Comparator.comparing((Reconnection r) -> circulates(ch, r.connection()))
                .thenComparingLong(r -> rankKey(r.relativeDeviation()))
                .thenComparing(r -> !r.unchanged()).thenComparingInt(Reconnection::parallelPaths));
        rewinds.sort(Comparator.comparing((RewindOption r) -> circulates(ch, r.connection()))
                .thenComparingLong(r -> rankKey(r.relativeDeviation()))
                .thenComparing(r -> r.connection() != machine.connection())
                .thenComparing(r -> r.parallelPaths() != machine.parallelPaths())
                .thenComparingInt(RewindOption::parallelPaths));
        List<String> notes = List.of(
                String.format(Locale.ROOT, "ranking: closest to the target first; %s",
                        circulates(ch, Connection.DELTA) ? String.format(Locale.ROOT, "delta options come after every "
                                + "star option, because the layout's third harmonic (kw3 %.3f) circulates in a closed "
                                + "delta", ch.thirdHarmonicWindingFactor())
                                : "then the present connection and paths, then fewer parallel paths"),
                "Ke of every option scales the measured Ke: the EMF per turn stays, only the turns in series change",
                String.format(Locale.ROOT, "predicted Ke, voltages and cut-in speeds carry the +-%.1f %% of the measured Ke",
                        100 * ch.keLineRmsVPerRpm().relativeUncertainty()),
                target.kind() == RewindTarget.Kind.BATTERY_CUT_IN
                        ? "cut-in: sqrt(2) x Ke_LL x n = battery + 2 diode drops (closed form; before load resistance)"
                        : "voltage: open-circuit line voltage = Ke_LL x n",
                machine.coilWindow().isEmpty()
                        ? "coil window unknown: fill is given relative to the present coil (wireAreaRatio; 1 = as now)"
                        : "fill checked against the stated coil window",
                outputNote(ch, target),
                String.format(Locale.ROOT, "winding temperature: estimated from the current density alone, the rise "
                        + "scaled by rho(T) J^2 so that the top of the %.0f to %.0f A/mm^2 band of an open, "
                        + "self-ventilated frame gives the class B rise of %.0f K (IEC 60034-1), in %.0f C air; about "
                        + "+-30 %% of the rise", ASSUMED_COOLING.lowAPerMm2(), ASSUMED_COOLING.highAPerMm2(),
                        BandTemperature.REFERENCE_RISE_K, ASSUMED_AMBIENT_C));
        return new RewindPlan(ch, target, wantedKe, ch.keLineRmsVPerRpm().relativeUncertainty(), reconnections,
                rewinds, notes);
    }

    /** True for a delta connection of a layout whose third-harmonic EMF would drive a circulating current. */
    static boolean circulates(MachineCharacterisation ch, Connection conn) {
        return conn == Connection.DELTA && ch.thirdHarmonicWindingFactor() > DELTA_KW3_CAUTION;
    }

    /**
     * Ranking key: the deviation's magnitude in steps of {@value #RANK_RESOLUTION}, so options that meet the target
     * equally well up to rounding noise tie and the tie-breaks (same connection, same paths, fewer paths) decide.
     */
    static long rankKey(double relativeDeviation) {
        return Math.round(Math.abs(relativeDeviation) / RANK_RESOLUTION);
    }

    private static String outputNote(MachineCharacterisation ch, RewindTarget target) {
        if (target.kind() != RewindTarget.Kind.BATTERY_CUT_IN) {
            return "output at the target speed is estimated for a battery target only";
        }
        if (ch.phaseResistanceOhm().isEmpty() || ch.phaseInductanceH().isEmpty()) {
            return "output at the target speed not estimated: it needs the line-to-line resistance and inductance";
        }
        return "output at the target speed: periodic steady state of the bridge into the battery (no cables, no"
                + " battery resistance), inductance scaled with the series turns squared";
    }

    private static List<Connection> connections(int phases) {
        return phases == 3 ? List.of(Connection.STAR, Connection.DELTA) : List.of(Connection.STAR);
    }

    /** Ke_LL of the machine regrouped to (conn, paths) with turnsPerCoil turns. */
    static double scaledKe(ExistingMachine machine, MachineCharacterisation ch, Connection conn, int paths,
                           double turnsPerCoil) {
        double cNew = Terminals.lineVoltageFactor(machine.phases(), conn);
        double cOld = Terminals.lineVoltageFactor(machine.phases(), machine.connection());
        return ch.keLineRmsVPerRpm().value() * (turnsPerCoil / machine.turnsPerCoil())
                * ((double) machine.parallelPaths() / paths) * (cNew / cOld);
    }

    private static Reconnection reconnection(ExistingMachine machine, MachineCharacterisation ch, RewindTarget target,
                                             Connection conn, int paths) {
        double ke = scaledKe(machine, ch, conn, paths, machine.turnsPerCoil());
        double achieved = target.achieved(ke);
        boolean unchanged = conn == machine.connection() && paths == machine.parallelPaths();
        double pathRatio = (double) machine.parallelPaths() / paths;
        Optional<Double> r = ch.phaseResistance20COhm().map(b -> b.value()
                * Copper.resistanceRatio(target.windingTemperatureC()) * pathRatio * pathRatio);
        String what = unchanged ? "as now: " + text(conn, paths)
                : "reconnect the existing coils " + text(conn, paths) + " (now " + text(machine.connection(),
                machine.parallelPaths()) + ")";
        Optional<OutputEstimate> output = OutputEstimator.at(machine, ch, target, conn, ke,
                ch.coilsPerPhase() * machine.turnsPerCoil() / paths, r);
        return new Reconnection(conn, paths, unchanged, ke, achieved, achieved / target.wanted() - 1,
                ke * target.targetSpeedRpm(), r, output, what, notes(ch, conn));
    }

    private static List<RewindOption> rewinds(ExistingMachine machine, MachineCharacterisation ch, RewindTarget target,
                                              Connection conn, int paths, double wantedKe) {
        double perTurnKe = scaledKe(machine, ch, conn, paths, 1.0);
        double exact = wantedKe / perTurnKe;
        long nearest = Math.round(exact);
        List<RewindOption> out = new ArrayList<>();
        for (long n = nearest - 1; n <= nearest + 1; n++) {
            if (n < 1 || n > ExistingMachine.MAX_TURNS_PER_COIL) {
                continue;
            }
            int turns = (int) n;
            double ke = perTurnKe * turns;
            double achieved = target.achieved(ke);
            double area = machine.wire().conductorCopperAreaM2() * machine.turnsPerCoil() / turns;
            List<WireChoice> wires = WireChoices.forArea(machine, ch, target, conn, turns, paths, ke, area);
            Optional<WireChoice> closest = wires.stream().filter(w -> w.currentDensityAPerMm2().isPresent())
                    .min(Comparator.comparingDouble(w -> Math.abs(Math.log(w.conductorCopperAreaM2() / area))));
            Optional<Double> density = closest.flatMap(WireChoice::currentDensityAPerMm2);
            List<String> notes = new ArrayList<>(notes(ch, conn));
            density.filter(j -> j > ASSUMED_COOLING.highAPerMm2()).ifPresent(j -> notes.add(String.format(Locale.ROOT,
                    "current density %.1f A/mm^2 at the working speed is above the %.0f to %.0f A/mm^2 usual for an "
                            + "open, self-ventilated frame: the winding runs hot%s", j, ASSUMED_COOLING.lowAPerMm2(),
                    ASSUMED_COOLING.highAPerMm2(), closest.flatMap(WireChoice::windingTemperatureC)
                            .map(t -> String.format(Locale.ROOT, " (about %.0f C)", t))
                            .orElse(" (no steady temperature: it keeps heating)"))));
            out.add(new RewindOption(conn, paths, turns, exact, ch.coilsPerPhase() * turns / paths, ke, achieved,
                    achieved / target.wanted() - 1, ke * target.targetSpeedRpm(), area, wires, notes, density,
                    closest.flatMap(WireChoice::windingTemperatureC)));
        }
        return out;
    }

    private static List<String> notes(MachineCharacterisation ch, Connection conn) {
        if (circulates(ch, conn)) {
            return List.of(String.format(Locale.ROOT, "delta: the winding's third-harmonic factor is %.3f, so a"
                    + " third-harmonic EMF would drive a current round the closed delta (heat and drag with no output);"
                    + " check the no-load current in the closed delta", ch.thirdHarmonicWindingFactor()));
        }
        return List.of();
    }

    private static String text(Connection conn, int paths) {
        return conn.name().toLowerCase(Locale.ROOT) + ", " + paths + (paths == 1 ? " path" : " parallel paths");
    }
}
