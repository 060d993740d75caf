package coilwright.rewind;

import coilwright.machine.Connection;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import static org.junit.jupiter.api.Assertions.*;

/** Properties of plans for random valid targets on the measured axial sample. */
class RewindPlannerPropertiesTest {
    static final ExistingMachine MACHINE = MeasuredMachines.existing(MeasuredMachines.axial(36), 16);

    @Property(tries = 200)
    void recommended_turns_cut_in_within_one_turn_step_of_the_wanted_speed(
            @ForAll @DoubleRange(min = 6, max = 120) double batteryV,
            @ForAll @DoubleRange(min = 40, max = 800) double cutInRpm,
            @ForAll @DoubleRange(min = 0, max = 1.5) double diodeDropV) {
        RewindTarget target = new RewindTarget(RewindTarget.Kind.BATTERY_CUT_IN, batteryV, cutInRpm, diodeDropV, 0, 0,
                600, 60);
        RewindPlan plan = RewindPlanner.plan(MACHINE, target);
        RewindOption best = plan.rewinds().get(0);
        Assume.that(best.exactTurnsPerCoil() >= 1.5);
        int n = best.turnsPerCoil();
        double perTurnKe = best.keLineRmsVPerRpm() / n;
        double step = Math.max(Math.abs(target.achieved(perTurnKe * (n - 1)) - target.achieved(perTurnKe * n)),
                Math.abs(target.achieved(perTurnKe * (n + 1)) - target.achieved(perTurnKe * n)));
        assertTrue(Math.abs(best.achieved() - cutInRpm) <= step * (1 + 1e-9),
                "cut-in " + best.achieved() + " vs wanted " + cutInRpm + ", one turn's step " + step);
    }

    @Property(tries = 100)
    void every_option_is_finite_and_positive(
            @ForAll @DoubleRange(min = 1, max = 400) double lineV,
            @ForAll @DoubleRange(min = 50, max = 2000) double atRpm,
            @ForAll @IntRange(min = -40, max = 200) int temperatureC) {
        RewindTarget target = new RewindTarget(RewindTarget.Kind.LINE_VOLTAGE, 0, 0, 0, lineV, atRpm, 500, temperatureC);
        RewindPlan plan = RewindPlanner.plan(MACHINE, target);
        for (Reconnection r : plan.reconnections()) {
            assertTrue(r.keLineRmsVPerRpm() > 0 && Double.isFinite(r.achieved()));
            assertTrue(r.phaseResistanceOhm().orElseThrow() > 0);
        }
        for (RewindOption o : plan.rewinds()) {
            assertTrue(o.turnsPerCoil() >= 1 && o.keLineRmsVPerRpm() > 0 && o.conductorCopperAreaM2() > 0);
            for (WireChoice w : o.wireChoices()) {
                double r = w.phaseResistanceOhm().orElseThrow();
                assertTrue(r > 0 && Double.isFinite(r), w.toString());
                assertTrue(w.copperAreaRatio() > 0 && Double.isFinite(w.wireAreaRatio()));
            }
        }
    }

    @Property(tries = 100)
    void delta_always_has_root_three_less_line_voltage_than_star_for_equal_paths(
            @ForAll @DoubleRange(min = 1, max = 400) double lineV) {
        RewindPlan plan = RewindPlanner.plan(MACHINE, RewindTarget.lineVoltage(lineV, 300, 300));
        for (int paths : plan.characterisation().allowedParallelPaths()) {
            double star = ke(plan, Connection.STAR, paths);
            double delta = ke(plan, Connection.DELTA, paths);
            assertEquals(star / Math.sqrt(3), delta, 1e-12 * star);
        }
    }

    private static double ke(RewindPlan plan, Connection c, int paths) {
        return plan.reconnections().stream().filter(r -> r.connection() == c && r.parallelPaths() == paths)
                .findFirst().orElseThrow().keLineRmsVPerRpm();
    }
}
