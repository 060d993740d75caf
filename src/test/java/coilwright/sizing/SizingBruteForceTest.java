package coilwright.sizing;

import coilwright.turbine.TableCp;
import coilwright.turbine.WindRotor;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.concurrent.ForkJoinPool;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * On small spaces the full model is run on every candidate: the search's ranking must be the brute force's, the
 * screen must never discard a candidate the full model accepts, and every design returned must meet every limit.
 */
class SizingBruteForceTest {
    private static final ForkJoinPool POOL = new ForkJoinPool(2);

    @AfterAll
    static void close() {
        POOL.shutdown();
    }

    private static void assertSearchMatchesBruteForce(SizingRequest req) {
        BruteForce all = new BruteForce(req, POOL);
        SizingResult result = new SizingSearch(POOL).run(req);
        assertTrue(result.provenBest(), "the search ran to its end");
        List<Long> expected = all.best(req.resultCount());
        assertFalse(expected.isEmpty(), "the space has feasible designs");
        assertEquals(expected, result.designs().stream().map(SizedDesign::candidate).toList(),
                "the k best by brute force, in order");
        assertScreenIsSafe(all);
        for (SizedDesign d : result.designs()) {
            assertEquals(List.of(), LimitAudit.breaches(req, result, d), () -> "design " + d.layout());
        }
        assertTrue(result.counts().prunedByLimit().stream().mapToLong(LimitCount::count).sum() > 0,
                "the screen discarded something");
    }

    /**
     * Every limit the screen proves broken is broken under the full model. The current-density and efficiency bounds
     * of speed targets hold for designs that deliver the rated power: there the full model breaks the limit or the
     * rated power. A candidate the full model refuses to build must have been discarded by the screen's fill check.
     */
    static void assertScreenIsSafe(BruteForce all) {
        List<Limit> limits = all.prepared.limits().limits();
        Limit power = limits.stream().filter(l -> l.name().equals("ratedPower")).findFirst().orElse(null);
        long rejected = 0;
        for (long c = 0; c < all.size; c++) {
            FullEvaluation f = all.full(c);
            List<Integer> screened = all.screenRejections(c);
            long candidate = c;
            if (!f.built()) {
                assertTrue(screened.stream().anyMatch(i -> limits.get(i).name().equals("fill")),
                        () -> "candidate " + candidate + " refused by the full model (" + f.refusal() + ") passed the fill screen");
                continue;
            }
            for (int i : screened) {
                rejected++;
                Limit l = limits.get(i);
                boolean conditional = (l.name().equals("currentDensity") || l.name().equals("efficiency")) && power != null;
                assertTrue(l.rejects(f) || conditional && power.rejects(f), () -> "candidate " + candidate
                        + ": the screen proved " + l.name() + " broken (" + l.screenBound(all.screen(candidate))
                        + ") but the full model gives " + l.figure(f) + " against " + l.allowed());
            }
        }
        assertTrue(rejected > 0, "the screen rejected something");
    }

    @Test
    void axial_wind_by_annual_energy() {
        assertSearchMatchesBruteForce(SizingFixtures.smallAxialWind(Objective.ANNUAL_ENERGY));
    }

    @Test
    void axial_wind_with_a_tabulated_cp_curve_by_rated_output() {
        SizingRequest small = SizingFixtures.smallAxialWind(Objective.OUTPUT_AT_RATED);
        WindDrive w = (WindDrive) small.drive();
        WindRotor tabled = new WindRotor(3.0, 3, new TableCp(new double[] {0, 2, 4, 6, 8, 10, 11},
                new double[] {0, 0.12, 0.30, 0.40, 0.33, 0.10, 0}), 500, 1.0, 1.0);
        assertSearchMatchesBruteForce(new SizingRequest(new WindDrive(tabled, w.site(), w.wind(), 25, 10),
                small.load(), small.build(), small.winding(), small.limits(), small.objective(), small.prices(), 3,
                10_000));
    }

    @Test
    void radial_hydro_by_annual_energy() {
        assertSearchMatchesBruteForce(SizingFixtures.smallRadialHydro(Objective.ANNUAL_ENERGY));
    }

    @Test
    void axial_speed_targets_by_rated_output() {
        assertSearchMatchesBruteForce(SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED,
                new Limits(7, 0, 0, 0, 0)));
    }

    @Test
    void axial_speed_targets_by_material_cost() {
        assertSearchMatchesBruteForce(SizingFixtures.smallAxialSpeed(Objective.MATERIAL_COST,
                new Limits(7, 0, 0, 0, 0)));
    }

    @Test
    void radial_speed_targets_by_rated_output_with_an_efficiency_floor() {
        assertSearchMatchesBruteForce(SizingFixtures.smallRadialSpeed(Objective.OUTPUT_AT_RATED,
                new Limits(6, 0, 0.5, 0, 0)));
    }

    @Test
    void radial_speed_targets_by_efficiency() {
        assertSearchMatchesBruteForce(SizingFixtures.smallRadialSpeed(Objective.EFFICIENCY_AT_RATED,
                new Limits(6, 0, 0, 0, 0)));
    }

    @Test
    void radial_speed_targets_by_active_mass() {
        assertSearchMatchesBruteForce(SizingFixtures.smallRadialSpeed(Objective.ACTIVE_MASS,
                new Limits(6, 0, 0, 0, 0)));
    }

    @Test
    void the_pareto_front_is_the_brute_force_front() {
        SizingRequest req = SizingFixtures.smallRadialSpeed(Objective.OUTPUT_AT_RATED, new Limits(6, 0, 0, 0, 0));
        BruteForce all = new BruteForce(req, POOL);
        SizingResult result = new SizingSearch(POOL).run(req);
        assertTrue(result.paretoComplete());
        assertEquals(all.front(), result.paretoFront().stream().map(SizedDesign::candidate).toList());
        assertTrue(result.paretoFront().size() >= 2, "a trade-off to show");
    }

    @Test
    void the_closed_forms_equal_the_full_models_own_figures() {
        BruteForce all = new BruteForce(SizingFixtures.smallRadialSpeed(Objective.OUTPUT_AT_RATED, Limits.defaults()),
                POOL);
        double checkSpeed = all.prepared.drive().checkSpeedRpm();
        int built = 0;
        for (long c = 0; c < all.size; c++) {
            FullEvaluation f = all.full(c);
            if (!f.built()) {
                assertTrue(f.refusal().contains("do not fit"), f.refusal());
                continue;
            }
            built++;
            ScreenValues s = all.screen(c);
            // same formulas in the same order: equal to rounding
            assertEquals(f.cutInSpeedRpm(), s.cutInRpm, 1e-12 * f.cutInSpeedRpm());
            assertEquals(f.openCircuitLineRmsV(), s.openCircuitV(checkSpeed), 1e-12 * f.openCircuitLineRmsV());
            assertEquals(f.fill(), s.fill, 1e-12 * f.fill());
            assertEquals(f.copperMassKg(), s.copperMassKg, 1e-12 * f.copperMassKg());
            assertEquals(f.magnetMassKg(), s.magnetMassKg, 1e-12 * f.magnetMassKg());
        }
        assertTrue(built > all.size / 2, "most candidates of this space can be built");
    }
}
