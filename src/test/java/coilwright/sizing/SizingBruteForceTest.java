package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.machine.Connection;
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

    /** Both machine limits bind on this space: each removes candidates the others accept. */
    @Test
    void radial_hydro_with_winding_temperature_and_cogging_limits() {
        SizingRequest base = SizingFixtures.smallRadialHydro(Objective.ANNUAL_ENERGY);
        SizingRequest req = withLimits(base, base.limits().withMaxWindingTempC(118).withMaxCoggingPercent(38));
        assertSearchMatchesBruteForce(req);
        assertBinds(new BruteForce(req, POOL), "cogging");
        SizingResult result = new SizingSearch(POOL).run(req);
        for (SizedDesign d : result.designs()) {
            assertTrue(d.figures().ratedWindingHotSpotC().orElseThrow() <= 118, "reported and within the limit");
            assertTrue(d.figures().coggingPercentOfRatedTorque().orElseThrow() <= 38, "reported and within the limit");
            assertTrue(d.figures().coggingPeakNm() > 0, "a slotted stator cogs");
        }
    }

    /** The temperature limit given without a current density replaces the cooling's band. */
    @Test
    void a_winding_temperature_limit_alone_replaces_the_current_density_band() {
        SizingRequest base = SizingFixtures.smallRadialHydro(Objective.ANNUAL_ENERGY);
        SizingRequest req = withLimits(base, Limits.defaults().withMaxWindingTempC(118));
        assertSearchMatchesBruteForce(req);
        assertBinds(new BruteForce(req, POOL), "windingTemperature");
        SizingResult result = new SizingSearch(POOL).run(req);
        List<String> applied = result.limits().stream().map(AppliedLimit::limit).toList();
        assertTrue(applied.contains("windingTemperature") && !applied.contains("currentDensity"), applied::toString);
        assertTrue(result.notes().stream().anyMatch(n -> n.contains("replaces")), result.notes()::toString);
    }

    /** A wind drive: the cogging screen's torque bound (rotor power over the cut-in speed) is used and safe. */
    @Test
    void radial_wind_with_a_cogging_limit() {
        SizingRequest req = new SizingRequest(SizingFixtures.wind2m(), SizingFixtures.leadAcid12V(),
                SizingFixtures.motorStator(8, 8), new WindingChoices(6, 12, WireRange.awg(16, 16, 1),
                List.of(Connection.STAR, Connection.DELTA), 1, 0.85, Cooling.OPEN_VENTILATED, ThermalClass.F, 90),
                Limits.defaults().withMaxCoggingPercent(COGGING_WIND_PERCENT), Objective.ANNUAL_ENERGY,
                new MaterialPrices(15, 60, 8), 3, 10_000);
        BruteForce all = new BruteForce(req, POOL);
        assertBinds(all, "cogging");
        assertSearchMatchesBruteForce(req);
    }

    private static final double COGGING_WIND_PERCENT = 9.9;

    private static SizingRequest withLimits(SizingRequest r, Limits limits) {
        return new SizingRequest(r.drive(), r.load(), r.build(), r.winding(), limits, r.objective(), r.prices(),
                r.resultCount(), r.maxFullEvaluations());
    }

    /** Each named limit rejects, under the full model, some built candidate that meets every other limit. */
    private static void assertBinds(BruteForce all, String... names) {
        List<Limit> limits = all.prepared.limits().limits();
        for (String name : names) {
            long alone = 0;
            for (long c = 0; c < all.size; c++) {
                FullEvaluation f = all.full(c);
                if (!f.built()) {
                    continue;
                }
                List<Limit> broken = limits.stream().filter(l -> l.rejects(f)).toList();
                alone += broken.size() == 1 && broken.get(0).name().equals(name) ? 1 : 0;
            }
            assertTrue(alone > 0, name + " binds on its own somewhere");
        }
    }

    /**
     * The wind energy bound (per row, the bridge's current at the top speed against the rotor's best power above the
     * cut-in) is at least the full model's energy for every candidate that charges, and within a quarter of it for
     * the best one.
     */
    @Test
    void the_wind_energy_bound_holds_for_every_candidate_and_is_tight_at_the_best() {
        BruteForce all = new BruteForce(SizingFixtures.smallAxialWind(Objective.ANNUAL_ENERGY), POOL);
        int checked = 0;
        for (long c = 0; c < all.size; c++) {
            FullEvaluation f = all.full(c);
            if (f.built() && f.charges()) {
                double bound = all.prepared.scoring().scoreBound(all.screen(c));
                assertTrue(bound >= f.annualEnergyKWh(), "candidate " + c + ": bound " + bound + " < "
                        + f.annualEnergyKWh());
                checked++;
            }
        }
        assertTrue(checked > 10, "candidates that charge");
        long best = all.best(1).get(0);
        double ratio = all.prepared.scoring().scoreBound(all.screen(best)) / all.full(best).annualEnergyKWh();
        assertTrue(ratio < TIGHT_AT_BEST, "bound over energy at the best: " + ratio);
    }

    /** How far above the best design's energy its bound may be. */
    private static final double TIGHT_AT_BEST = 1.25;

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
