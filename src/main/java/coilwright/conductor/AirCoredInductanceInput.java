package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * Geometry of the flat air-cored coils of one phase, for {@link InductanceEstimate#airCored}.
 *
 * @param turnsPerCoil    turns of each coil, 1 to 100000
 * @param coilsPerPhase   coils in the phase, 1 to 10000
 * @param parallelPaths   parallel paths; must divide coilsPerPhase
 * @param meanTurnLengthM mean turn length of one coil, m, &gt; 0 (see {@link MeanTurnLength#axialCoil})
 * @param legWidthM       radial build of the winding (width of the wound bundle in the coil's plane), m, &gt; 0
 * @param coilThicknessM  axial thickness of the coil, m, &gt; 0
 */
public record AirCoredInductanceInput(int turnsPerCoil, int coilsPerPhase, int parallelPaths,
                                      double meanTurnLengthM, double legWidthM, double coilThicknessM) {
    public AirCoredInductanceInput {
        Checks c = new Checks().intRange("turnsPerCoil", turnsPerCoil, 1, 100_000)
                .intRange("coilsPerPhase", coilsPerPhase, 1, 10_000)
                .intRange("parallelPaths", parallelPaths, 1, 10_000)
                .positive("meanTurnLengthM", meanTurnLengthM).positive("legWidthM", legWidthM)
                .positive("coilThicknessM", coilThicknessM);
        if (parallelPaths >= 1 && coilsPerPhase >= 1) {
            c.require(coilsPerPhase % parallelPaths == 0, "parallelPaths", parallelPaths,
                    "must divide coilsPerPhase = " + coilsPerPhase, "a divisor of coilsPerPhase");
        }
        if (Double.isFinite(meanTurnLengthM) && Double.isFinite(legWidthM)) {
            c.require(meanTurnLengthM > Math.PI * legWidthM, "meanTurnLengthM", meanTurnLengthM,
                    "must exceed pi * legWidthM = " + Checks.fmt(Math.PI * legWidthM)
                            + " (the mean turn encloses the hole plus half the bundle)", "> pi * legWidthM");
        }
        c.throwIfAny();
    }
}
