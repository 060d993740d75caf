package coilwright.rewind;

import coilwright.conductor.BandTemperature;
import coilwright.conductor.Copper;
import coilwright.conductor.FillCheck;
import coilwright.conductor.WireCatalogue;
import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Stock wires for a rewind that keeps the copper area per coil, with their resistance and fill. */
final class WireChoices {
    /** Most strands in hand offered (common practice: more is hard to wind evenly). */
    static final int MAX_STRANDS = 12;
    /** Strands-in-hand alternatives listed per rewind option (the closest ones). */
    static final int STRAND_OPTIONS_LISTED = 3;

    private WireChoices() {
    }

    /**
     * The nearest AWG and metric sizes below and above the wanted conductor area, then up to
     * {@value #STRAND_OPTIONS_LISTED} multi-strand alternatives within +-5 %.
     */
    static List<WireChoice> forArea(ExistingMachine machine, MachineCharacterisation ch, RewindTarget target,
                                    Connection conn, int turnsPerCoil, int parallelPaths, double keLineRmsVPerRpm,
                                    double areaM2) {
        Option o = new Option(machine, ch, target, conn, turnsPerCoil, parallelPaths, keLineRmsVPerRpm);
        List<WireChoice> out = new ArrayList<>();
        WireCatalogue.SizeBracket awg = WireCatalogue.nearestAwgBelowAndAbove(areaM2);
        WireCatalogue.SizeBracket metric = WireCatalogue.nearestMetricBelowAndAbove(areaM2);
        awg.below().ifPresent(w -> out.add(choice("AWG below", w, o)));
        awg.above().ifPresent(w -> out.add(choice("AWG above", w, o)));
        metric.below().ifPresent(w -> out.add(choice("metric below", w, o)));
        metric.above().ifPresent(w -> out.add(choice("metric above", w, o)));
        WireCatalogue.strandAlternatives(areaM2, MAX_STRANDS).stream()
                .filter(s -> s.wire().strandsInHand() > 1)
                .sorted((a, b) -> Double.compare(Math.abs(a.relativeDeviation()), Math.abs(b.relativeDeviation())))
                .limit(STRAND_OPTIONS_LISTED)
                .forEach(s -> out.add(choice("strands in hand", s.wire(), o)));
        return out;
    }

    /** The option a wire is chosen for. */
    private record Option(ExistingMachine machine, MachineCharacterisation ch, RewindTarget target, Connection conn,
                          int turnsPerCoil, int parallelPaths, double keLineRmsVPerRpm) {
    }

    private static WireChoice choice(String role, WireSpec wire, Option o) {
        ExistingMachine machine = o.machine();
        int turnsPerCoil = o.turnsPerCoil();
        int parallelPaths = o.parallelPaths();
        MachineCharacterisation ch = o.ch();
        double temperatureC = o.target().windingTemperatureC();
        WireSpec old = machine.wire();
        double copperRatio = turnsPerCoil * wire.conductorCopperAreaM2()
                / (machine.turnsPerCoil() * old.conductorCopperAreaM2());
        double wireRatio = turnsPerCoil * wire.conductorOverallAreaM2()
                / (machine.turnsPerCoil() * old.conductorOverallAreaM2());
        Optional<Double> r = ch.meanTurnLengthM().map(mlt -> phaseResistanceOhm(turnsPerCoil, ch.coilsPerPhase(),
                parallelPaths, mlt.value(), wire, temperatureC));
        Optional<FillCheck> fill = machine.coilWindowIfKnown().map(win -> FillCheck.of(turnsPerCoil, wire, win));
        int nPh = ch.coilsPerPhase() * turnsPerCoil / parallelPaths;
        Optional<OutputEstimate> output = OutputEstimator.at(machine, ch, o.target(), o.conn(), o.keLineRmsVPerRpm(),
                nPh, r);
        Optional<Double> density = output.map(out -> out.phaseCurrentRmsA() / parallelPaths
                / (wire.conductorCopperAreaM2() * 1e6));
        Optional<Double> temperature = density.flatMap(j -> {
            var t = BandTemperature.windingC(Math.min(j, 100), RewindPlanner.ASSUMED_COOLING,
                    RewindPlanner.ASSUMED_AMBIENT_C);
            return t.isPresent() ? Optional.of(t.getAsDouble()) : Optional.empty();
        });
        return new WireChoice(role, wire, wire.conductorCopperAreaM2(), copperRatio, wireRatio, r, fill, output,
                density, temperature);
    }

    /** R_ph = rho(T) N_c C MLT / (A a^2), Ohm. */
    static double phaseResistanceOhm(int turnsPerCoil, int coilsPerPhase, int parallelPaths, double mltM,
                                     WireSpec wire, double temperatureC) {
        return Copper.resistivityOhmM(temperatureC) * turnsPerCoil * coilsPerPhase * mltM
                / (wire.conductorCopperAreaM2() * parallelPaths * parallelPaths);
    }
}
