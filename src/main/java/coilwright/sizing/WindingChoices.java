package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.machine.Connection;
import coilwright.validation.Checks;

import java.util.List;

/**
 * The winding choices the search may make, and the conditions the winding works in.
 *
 * @param minTurnsPerCoil    fewest turns per coil, 1 to 2000
 * @param maxTurnsPerCoil    most turns per coil, minTurnsPerCoil to 2000
 * @param wire               the wire sizes and strands in hand available
 * @param connections        STAR, DELTA or both
 * @param maxParallelPaths   most parallel paths per phase, 1 to 16 (only the counts the layout allows are used)
 * @param minWindingFactor   floor on the fundamental winding factor of a slot/pole or coil/magnet layout, 0.3 to 1
 * @param cooling            the cooling (sets the default current-density limit)
 * @param insulationClass    thermal class of the magnet wire
 * @param windingTempC       working winding temperature for the resistance, C, -40 to 250
 */
public record WindingChoices(int minTurnsPerCoil, int maxTurnsPerCoil, WireRange wire, List<Connection> connections,
                             int maxParallelPaths, double minWindingFactor, Cooling cooling,
                             ThermalClass insulationClass, double windingTempC) {
    public static final int MAX_TURNS = 2000;

    public WindingChoices {
        Checks c = new Checks().intRange("minTurnsPerCoil", minTurnsPerCoil, 1, MAX_TURNS)
                .intRange("maxTurnsPerCoil", maxTurnsPerCoil, 1, MAX_TURNS).present("wire", wire)
                .present("connections", connections).intRange("maxParallelPaths", maxParallelPaths, 1, 16)
                .range("minWindingFactor", minWindingFactor, 0.3, 1.0).present("cooling", cooling)
                .present("insulationClass", insulationClass).range("windingTempC", windingTempC, -40, 250);
        c.require(maxTurnsPerCoil >= minTurnsPerCoil, "maxTurnsPerCoil", maxTurnsPerCoil,
                "must be at least minTurnsPerCoil = " + minTurnsPerCoil, ">= minTurnsPerCoil");
        BuildChecks.entriesPresent(c, "connections", connections);
        c.throwIfAny();
        connections = List.copyOf(connections);
        c.intRange("connections.size", connections.size(), 1, 2);
        c.require(connections.stream().distinct().count() == connections.size(), "connections", connections,
                "must not repeat a connection", "STAR, DELTA or both");
        c.throwIfAny();
    }

    /** Number of turn counts tried. */
    public int turnCount() {
        return maxTurnsPerCoil - minTurnsPerCoil + 1;
    }
}
