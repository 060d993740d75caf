package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.machine.Connection;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.lifecycle.AfterContainer;

import java.util.List;
import java.util.concurrent.ForkJoinPool;

/**
 * Random speed targets and limits on small axial and radial spaces: whatever the screen discards, the full model
 * rejects too (brute force over every candidate of each space).
 */
class ScreenSafetyPropertiesTest {
    private static final ForkJoinPool POOL = new ForkJoinPool(2);

    @AfterContainer
    static void close() {
        POOL.shutdown();
    }

    @Property(tries = 8)
    void the_screen_discards_only_what_the_full_model_rejects(
            @ForAll boolean axial,
            @ForAll @DoubleRange(min = 100, max = 300) double cutInRpm,
            @ForAll @DoubleRange(min = 1.2, max = 3) double ratedOverCutIn,
            @ForAll @DoubleRange(min = 50, max = 1500) double ratedPowerW,
            @ForAll @DoubleRange(min = 2, max = 12) double maxCurrentDensity,
            @ForAll @DoubleRange(min = 0.2, max = 0.7) double maxFill,
            @ForAll @DoubleRange(min = 0, max = 0.9) double minEfficiency,
            @ForAll @DoubleRange(min = 20, max = 200) double maxOpenCircuitV,
            @ForAll @IntRange(min = 2, max = 40) int minTurns) {
        Limits limits = new Limits(maxCurrentDensity, maxFill, minEfficiency, maxOpenCircuitV, 0);
        SpeedTargets targets = new SpeedTargets(cutInRpm, cutInRpm * ratedOverCutIn, ratedPowerW, 0);
        SizingRequest req = axial
                ? new SizingRequest(targets, SizingFixtures.leadAcid24V(),
                new AxialBuild(List.of(0.40), 0.01, List.of(0.016), 0.0015, 0.001, 14, 16,
                        List.of(new MagnetOption("N42", 0.040, 0.050, 0.010, List.of(1))), 40),
                new WindingChoices(minTurns, minTurns + 12, WireRange.awg(13, 17, 2),
                        List.of(Connection.STAR, Connection.DELTA), 2, 0.9, Cooling.AIR_COOLED_AXIAL_OPEN_COIL,
                        ThermalClass.H, 70), limits, Objective.OUTPUT_AT_RATED, MaterialPrices.none(), 3, 100_000)
                : new SizingRequest(targets, SizingFixtures.leadAcid12V(), SizingFixtures.motorStator(8, 12),
                new WindingChoices(Math.max(2, minTurns / 3), Math.max(2, minTurns / 3) + 8, WireRange.awg(15, 19, 2),
                        List.of(Connection.STAR, Connection.DELTA), 2, 0.85, Cooling.ENCLOSED_NATURAL, ThermalClass.F,
                        80), limits, Objective.OUTPUT_AT_RATED, MaterialPrices.none(), 3, 100_000);
        SizingBruteForceTest.assertScreenIsSafe(new BruteForce(req, POOL));
    }
}
