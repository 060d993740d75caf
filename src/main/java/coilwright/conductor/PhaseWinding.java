package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * The copper of one phase: its coils, how they are connected and the wire.
 *
 * @param turnsPerCoil    turns of each coil, 1 to 100000
 * @param coilsPerPhase   coils in the phase, 1 to 10000
 * @param parallelPaths   parallel paths the coils are connected in; must divide coilsPerPhase
 * @param meanTurnLengthM mean length of one turn, m, &gt; 0 and &lt;= 100
 * @param wire            the conductor, with its strands in hand
 */
public record PhaseWinding(int turnsPerCoil, int coilsPerPhase, int parallelPaths, double meanTurnLengthM,
                           WireSpec wire) {
    public PhaseWinding {
        Checks c = new Checks().intRange("turnsPerCoil", turnsPerCoil, 1, 100_000)
                .intRange("coilsPerPhase", coilsPerPhase, 1, 10_000)
                .intRange("parallelPaths", parallelPaths, 1, 10_000)
                .rangeExclusiveMin("meanTurnLengthM", meanTurnLengthM, 0.0, 100.0)
                .present("wire", wire);
        if (parallelPaths >= 1 && coilsPerPhase >= 1) {
            c.require(coilsPerPhase % parallelPaths == 0, "parallelPaths", parallelPaths,
                    "must divide coilsPerPhase = " + coilsPerPhase, "a divisor of coilsPerPhase");
        }
        c.throwIfAny();
    }

    /** Series turns per phase N_ph = turnsPerCoil * coilsPerPhase / parallelPaths. */
    public int seriesTurnsPerPhase() {
        return turnsPerCoil * coilsPerPhase / parallelPaths;
    }

    /** Length of the conductor (each strand) in all coils of the phase, turns * coils * MLT, m. */
    public double conductorLengthM() {
        return (double) turnsPerCoil * coilsPerPhase * meanTurnLengthM;
    }
}
