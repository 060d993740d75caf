package coilwright.sizing;

import coilwright.validation.Checks;

import java.util.List;

/**
 * A dual-rotor axial-flux alternator with an air-cored coil stator. The magnets sit on a circle as far out as the
 * disc allows (outer edge at the disc radius less the rim margin). The coils lie side by side round the ring: each
 * coil's hole is as wide as a magnet (at most a third of the room per coil) and its legs take the rest of the room
 * at the magnets' inner radius, less a gap between neighbouring coils, up to half a pole pitch each (common
 * practice); three-phase double-layer layouts only (one coil per coil position), 3/4 to 3/2 coils per pole.
 *
 * @param discDiametersM      rotor disc diameters to try, m, each 0.1 to 3, 1 to 6 entries (the largest is the size limit)
 * @param rimMarginM          steel left outside the magnets' outer edge, m, 0 to 0.1
 * @param coilLayerThicknessesM  coil (stator) thicknesses to try, m, each 4 mm to 60 mm, 1 to 4 entries
 * @param clearancePerSideM   clearance between each magnet face and the stator, m, 0.3 mm to 10 mm
 * @param coilGapM            gap between neighbouring coils at the inner radius, m, 0 to 20 mm
 * @param minPoles            fewest poles, even, 4 to 400
 * @param maxPoles            most poles, even, minPoles to 400
 * @param magnets             the magnet blocks available, 1 to 6
 * @param magnetTempC         working magnet temperature, C, -40 to 250
 */
public record AxialBuild(List<Double> discDiametersM, double rimMarginM, List<Double> coilLayerThicknessesM,
                         double clearancePerSideM, double coilGapM, int minPoles, int maxPoles,
                         List<MagnetOption> magnets, double magnetTempC) implements Build {
    public AxialBuild {
        Checks c = new Checks().present("discDiametersM", discDiametersM)
                .present("coilLayerThicknessesM", coilLayerThicknessesM).present("magnets", magnets)
                .range("rimMarginM", rimMarginM, 0, 0.1).range("clearancePerSideM", clearancePerSideM, 0.0003, 0.01)
                .range("coilGapM", coilGapM, 0, 0.02).range("magnetTempC", magnetTempC, -40, 250);
        BuildChecks.poles(c, minPoles, maxPoles, 4);
        BuildChecks.entriesPresent(c, "discDiametersM", discDiametersM);
        BuildChecks.entriesPresent(c, "coilLayerThicknessesM", coilLayerThicknessesM);
        BuildChecks.entriesPresent(c, "magnets", magnets);
        c.throwIfAny();
        discDiametersM = List.copyOf(discDiametersM);
        coilLayerThicknessesM = List.copyOf(coilLayerThicknessesM);
        magnets = List.copyOf(magnets);
        BuildChecks.list(c, "discDiametersM", discDiametersM, 6, 0.1, 3.0);
        BuildChecks.list(c, "coilLayerThicknessesM", coilLayerThicknessesM, 4, 0.004, 0.06);
        c.intRange("magnets.size", magnets.size(), 1, 6);
        c.throwIfAny();
    }
}
