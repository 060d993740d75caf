package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ImpulseRunnerTest {
    private final ImpulseRunner pelton = ImpulseRunner.pelton(50, 0.01, 1, 0.2);

    @Test
    void peak_power_is_at_the_optimum_speed_and_equals_rho_g_q_h_eta() {
        double nOpt = pelton.optimumSpeedRpm();
        assertEquals(1000 * 9.80665 * 0.01 * 50 * 0.8, pelton.powerW(nOpt), 1e-9);
        assertTrue(pelton.powerW(0.95 * nOpt) < pelton.powerW(nOpt));
        assertTrue(pelton.powerW(1.05 * nOpt) < pelton.powerW(nOpt));
    }

    @Test
    void torque_falls_linearly_from_stall_to_zero_at_runaway() {
        double t0 = pelton.stallTorqueNm();
        double nr = pelton.runawaySpeedRpm();
        assertEquals(t0, pelton.torqueNm(0), 1e-12);
        assertEquals(0.75 * t0, pelton.torqueNm(0.25 * nr), 1e-9);
        assertEquals(0.0, pelton.torqueNm(nr), 1e-12);
        assertEquals(0.0, pelton.torqueNm(1.2 * nr));
    }

    @Test
    void runaway_bucket_speed_is_0_92_of_jet_speed() {
        double runawayBucketMs = pelton.runawaySpeedRpm() * Math.PI * 0.2 / 60;
        assertEquals(0.92, runawayBucketMs / pelton.jetVelocityMs(), 1e-12);
    }

    @Test
    void for_target_speed_gives_a_runner_running_at_that_speed() {
        ImpulseRunner r = ImpulseRunner.forTargetSpeed(80, 0.008, 2, 1500);
        assertEquals(1500, r.optimumSpeedRpm(), 1e-9);
    }

    @Test
    void more_jets_make_smaller_nozzles() {
        assertEquals(pelton.nozzleDiameterM() / Math.sqrt(2), ImpulseRunner.pelton(50, 0.01, 2, 0.2).nozzleDiameterM(), 1e-12);
    }

    @Test
    void warns_when_the_runner_is_small_for_its_jet() {
        assertTrue(ImpulseRunner.pelton(10, 0.02, 1, 0.15).warnings().get(0).contains("jet diameters"));
        assertTrue(pelton.warnings().isEmpty());
    }

    @Test
    void rejects_negative_head_and_seven_jets() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ImpulseRunner.pelton(-3, 0.01, 7, 0.2));
        assertEquals("netHeadM", e.errors().get(0).field());
        assertEquals("jetCount", e.errors().get(1).field());
        assertEquals("jetCount = 7: must be between 1 and 6", e.errors().get(1).message());
    }

    @Test
    void rejects_a_negative_speed() {
        assertEquals("runnerSpeedRpm", assertThrows(InvalidInputException.class, () -> pelton.powerW(-1))
                .errors().get(0).field());
    }

    @Property
    void shaft_power_never_exceeds_water_power(@ForAll @DoubleRange(min = 1, max = 500) double head,
                                               @ForAll @DoubleRange(min = 0.01, max = 1) double flow,
                                               @ForAll @IntRange(min = 1, max = 6) int jets,
                                               @ForAll @DoubleRange(min = 0, max = 10_000) double rpm) {
        ImpulseRunner r = ImpulseRunner.pelton(head, flow, jets, 0.5);
        double p = r.powerW(rpm);
        assertTrue(p >= 0 && p <= r.hydraulicPowerW());
        assertTrue(r.runawaySpeedRpm() > r.optimumSpeedRpm());
    }
}
