package coilwright.sizing;

import coilwright.machine.SlottedStator;
import coilwright.magnet.RotorSide;
import coilwright.validation.Checks;

import java.util.List;

/**
 * A radial-flux alternator with surface magnets in (inner rotor) or round (outer rotor) a slotted stator the builder
 * has: its diameter at the gap, stack, slot count and slot window are given; the search chooses the poles, magnets
 * and winding. The magnets run the whole stack length; a pole's arc is the blocks' widths side by side, which must
 * make a pole-arc ratio of 0.3 to 1.
 *
 * @param side          INNER (rotor in the bore) or OUTER (rotor round the stator)
 * @param gapDiameterM  stator diameter at the gap (bore, or outer diameter for an outer rotor), m, 0.02 to 2
 * @param stackLengthM  stack length, m, 5 mm to 1 m
 * @param slots         stator slots, 6 to 400, a multiple of 3
 * @param stator        the slot window (depth, width, tooth tip, liner, end extension)
 * @param airGapM       mechanical gap between iron and magnets, m, 0.2 mm to 10 mm
 * @param slotOpeningM  slot opening at the gap, m, 0 to 20 mm
 * @param layers        layers to try: SINGLE, DOUBLE or both
 * @param minPoles      fewest poles, even, 2 to 400
 * @param maxPoles      most poles, even, minPoles to 400
 * @param magnets       the magnet blocks available, 1 to 6
 * @param magnetTempC   working magnet temperature, C, -40 to 250
 */
public record RadialBuild(RotorSide side, double gapDiameterM, double stackLengthM, int slots, SlottedStator stator,
                          double airGapM, double slotOpeningM, List<coilwright.winding.Layers> layers, int minPoles,
                          int maxPoles, List<MagnetOption> magnets, double magnetTempC) implements Build {
    public RadialBuild {
        Checks c = new Checks().present("side", side).present("stator", stator).present("layers", layers)
                .present("magnets", magnets)
                .range("gapDiameterM", gapDiameterM, 0.02, 2).range("stackLengthM", stackLengthM, 0.005, 1)
                .intRange("slots", slots, 6, 400).range("airGapM", airGapM, 0.0002, 0.01)
                .range("slotOpeningM", slotOpeningM, 0, 0.02).range("magnetTempC", magnetTempC, -40, 250);
        c.require(slots % 3 == 0, "slots", slots, "must be a multiple of 3 (three-phase windings)", "multiples of 3");
        BuildChecks.poles(c, minPoles, maxPoles, 2);
        BuildChecks.entriesPresent(c, "layers", layers);
        BuildChecks.entriesPresent(c, "magnets", magnets);
        c.throwIfAny();
        layers = List.copyOf(layers);
        magnets = List.copyOf(magnets);
        c.intRange("layers.size", layers.size(), 1, 2);
        c.require(layers.stream().distinct().count() == layers.size(), "layers", layers, "must not repeat a layer",
                "SINGLE, DOUBLE or both");
        c.intRange("magnets.size", magnets.size(), 1, 6);
        c.throwIfAny();
    }
}
