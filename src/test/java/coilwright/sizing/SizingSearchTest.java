package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.machine.Connection;
import coilwright.safety.Caution;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicBoolean;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SizingSearchTest {
    private static final ForkJoinPool ONE = new ForkJoinPool(1);
    private static final ForkJoinPool TWO = new ForkJoinPool(2);

    @AfterAll
    static void close() {
        ONE.shutdown();
        TWO.shutdown();
    }

    @Test
    void the_same_request_gives_the_same_answer_on_one_and_on_two_threads() {
        SizingRequest req = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, new Limits(7, 0, 0, 0, 0));
        SizingResult one = new SizingSearch(ONE).run(req);
        SizingResult two = new SizingSearch(TWO).run(req);
        assertEquals(one, two);
        assertEquals(4, one.designs().size());
    }

    @Test
    void a_search_stopped_by_its_budget_is_the_same_on_one_and_on_two_threads_and_says_so() {
        SizingRequest small = SizingFixtures.smallAxialWind(Objective.ANNUAL_ENERGY);
        SizingRequest req = new SizingRequest(small.drive(), small.load(), small.build(), small.winding(),
                small.limits(), small.objective(), small.prices(), 2, 10);
        SizingResult one = new SizingSearch(ONE).run(req);
        SizingResult two = new SizingSearch(TWO).run(req);
        assertEquals(one, two);
        assertFalse(one.provenBest());
        assertTrue(one.unexploredBound().isPresent());
        double best = one.designs().get(0).figures().annualEnergyKWh().orElseThrow();
        assertTrue(one.unexploredBound().getAsDouble() >= best, "the bound of what is left is no less than the best found");
        assertTrue(one.notes().stream().anyMatch(n -> n.contains("maxFullEvaluations")));
    }

    @Test
    void the_counts_add_up() {
        SizingResult r = new SizingSearch(TWO).run(SizingFixtures.smallAxialSpeed(Objective.MATERIAL_COST,
                new Limits(7, 0, 0, 0, 0)));
        SizingCounts c = r.counts();
        long pruned = c.prunedByLimit().stream().mapToLong(LimitCount::count).sum();
        assertEquals(c.candidatesInSpace(), c.screened());
        assertEquals(c.screened(), pruned + c.passedScreen());
        long rejected = c.rejectedByFullModel().stream().mapToLong(LimitCount::count).sum();
        assertTrue(rejected + r.designs().size() <= c.fullyEvaluated());
        assertEquals(r.designs().size(), c.returned());
        long layouts = c.layoutsRejected().stream().mapToLong(LimitCount::count).sum() + c.layoutsSearched();
        assertEquals(c.layoutsConsidered(), layouts);
    }

    @Test
    void when_nothing_meets_the_limits_the_nearest_misses_name_the_binding_limit() {
        SizingRequest req = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, new Limits(5, 0, 0, 0, 0));
        SizingResult r = new SizingSearch(TWO).run(req);
        assertFalse(r.feasible());
        assertFalse(r.nearMisses().isEmpty());
        NearMiss first = r.nearMisses().get(0);
        assertEquals("currentDensity", first.limit());
        assertEquals(5.0, first.allowed());
        assertTrue(first.needed() > 5.0 && first.needed() < 7.0, () -> "needs " + first.needed());
        assertTrue(first.message().startsWith("nothing that stays within 5.0 A/mm^2 at the rated point also "),
                first.message());
        assertTrue(first.message().contains("the closest needs"), first.message());
        List<String> breaches = LimitAudit.breaches(req, r, first.design());
        assertEquals(1, breaches.size(), breaches::toString);
        assertTrue(breaches.get(0).startsWith("currentDensity"), breaches::toString);
    }

    @Test
    void a_space_larger_than_the_cap_is_refused_with_its_size_and_how_to_narrow_it() {
        SizingRequest small = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, Limits.defaults());
        WindingChoices huge = new WindingChoices(1, 2000, WireRange.awg(10, 30, 12), List.of(Connection.STAR,
                Connection.DELTA), 16, 0.9, Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 70);
        SizingRequest req = new SizingRequest(small.drive(), small.load(),
                SizingFixtures.axialBuild(List.of(0.36, 0.39, 0.42), 12, 20), huge, small.limits(), small.objective(),
                small.prices(), 4, 1000);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SizingSearch(TWO).run(req));
        assertEquals("winding.maxTurnsPerCoil", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("candidates, more than the 20,000,000 allowed"), e.getMessage());
        assertTrue(e.getMessage().contains("Narrow it"), e.getMessage());
    }

    @Test
    void too_many_layout_combinations_are_refused_naming_the_build() {
        SizingRequest small = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, Limits.defaults());
        AxialBuild wide = new AxialBuild(List.of(0.3, 0.4, 0.5, 0.6, 0.7, 0.8), 0.01, List.of(0.01, 0.012, 0.014, 0.016),
                0.0015, 0.001, 4, 400, List.of(new MagnetOption("N42", 0.02, 0.03, 0.01, List.of(1, 2, 3, 4))), 40);
        SizingRequest req = new SizingRequest(small.drive(), small.load(), wide, small.winding(), small.limits(),
                small.objective(), small.prices(), 4, 1000);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SizingSearch(TWO).run(req));
        assertEquals("build", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("narrow the pole range"), e.getMessage());
    }

    @Test
    void progress_runs_through_the_stages_in_order_and_a_cancelled_search_stops() {
        SizingRequest req = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, new Limits(7, 0, 0, 0, 0));
        List<SizingProgress.Stage> stages = new ArrayList<>();
        new SizingSearch(TWO).run(req, (stage, done, total) -> {
            assertTrue(done <= total || stage == SizingProgress.Stage.PARETO || stage == SizingProgress.Stage.REFINE);
            if (stages.isEmpty() || stages.get(stages.size() - 1) != stage) {
                stages.add(stage);
            }
        }, () -> false);
        assertEquals(List.of(SizingProgress.Stage.LAYOUTS, SizingProgress.Stage.SCREEN, SizingProgress.Stage.REFINE),
                stages.subList(0, 3));
        for (int i = 1; i < stages.size(); i++) {
            assertTrue(stages.get(i).ordinal() > stages.get(i - 1).ordinal(), stages::toString);
        }
        AtomicBoolean cancel = new AtomicBoolean();
        assertThrows(CancellationException.class, () -> new SizingSearch(TWO).run(req,
                (stage, done, total) -> cancel.set(stage == SizingProgress.Stage.SCREEN), cancel::get));
    }

    @Test
    void the_default_open_circuit_limit_is_extra_low_voltage_only_where_the_battery_allows_it() {
        SizingResult lowVoltage = new SizingSearch(TWO).run(SizingFixtures.smallRadialSpeed(Objective.OUTPUT_AT_RATED,
                new Limits(6, 0, 0, 0, 0)));
        AppliedLimit elv = lowVoltage.limits().stream().filter(l -> l.limit().equals("openCircuitVoltage"))
                .findFirst().orElseThrow();
        assertEquals(50.0, elv.allowed());
        // 24 V charging by 180 rpm reaches (25.6 / sqrt 2) x 600 / 180 = 60 V at 600 rpm: above 50 V
        SizingResult highVoltage = new SizingSearch(TWO).run(SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED,
                new Limits(7, 0, 0, 0, 0)));
        assertTrue(highVoltage.limits().stream().noneMatch(l -> l.limit().equals("openCircuitVoltage")));
        assertTrue(highVoltage.notes().stream().anyMatch(n -> n.startsWith("No open-circuit limit")
                && n.contains("at least 60 V")), highVoltage.notes()::toString);
        // and every design says so among its cautions, first; the low-voltage ones only as a notice
        for (SizedDesign d : highVoltage.designs()) {
            assertEquals("OPEN_CIRCUIT_VOLTAGE", d.cautions().get(0).code());
            assertEquals(Caution.Severity.DANGER, d.cautions().get(0).severity());
        }
        for (SizedDesign d : lowVoltage.designs()) {
            assertTrue(d.cautions().stream().anyMatch(c -> c.code().equals("OPEN_CIRCUIT_VOLTAGE")
                    && c.severity() == Caution.Severity.NOTICE));
        }
    }
}
