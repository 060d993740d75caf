package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.thermal.WindingTemperature;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/** Properties of the loss breakdown and the solved winding temperature over random valid designs and speeds. */
class MachineLossesPropertiesTest {
    private final AlternatorEvaluatorPropertiesTest designs = new AlternatorEvaluatorPropertiesTest();

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<AlternatorEvaluatorPropertiesTest.Case> cases() {
        return designs.cases();
    }

    @Property(tries = 40)
    void losses_are_never_negative_and_shaft_power_is_output_plus_every_loss(
            @ForAll("cases") AlternatorEvaluatorPropertiesTest.Case c,
            @ForAll @DoubleRange(min = 0, max = 600) double speedRpm) {
        Alternator alt = AlternatorModel.build(c.spec());
        LossPoint p = new MachineLosses(alt, c.load(), 25).steadyAt(speedRpm);
        double[] all = {p.powerToLoadW(), p.windingCopperLossW(), p.conductorEddyLossW(), p.deltaCirculationLossW(),
                p.statorIronLossW(), p.bearingFrictionLossW(), p.windageLossW(), p.diodeLossW(), p.cableLossW(),
                p.batteryInternalLossW(), p.shaftPowerW(), p.shaftTorqueNm(), p.efficiency()};
        for (double v : all) {
            assertTrue(Double.isFinite(v) && v >= 0, "finite and non-negative: " + p);
        }
        assertEquals(p.shaftPowerW(), p.powerToLoadW() + p.totalLossW(), 1e-6 * Math.max(1, p.shaftPowerW()),
                "shaft power = output + every loss");
        assertTrue(p.windingMeanC() >= 25 - WindingTemperature.ACCURACY_K, "never below ambient: " + p);
        assertTrue(p.windingHotSpotC() >= p.windingMeanC() - WindingTemperature.ACCURACY_K || !p.temperatureSettled(),
                "the hot spot is at least the mean, within the fixed point's accuracy: " + p);
    }

    @Property(tries = 20)
    void the_winding_is_no_cooler_at_a_higher_speed_under_a_battery_load(
            @ForAll("cases") AlternatorEvaluatorPropertiesTest.Case c,
            @ForAll @DoubleRange(min = 50, max = 400) double speedRpm) {
        if (!(c.load() instanceof coilwright.load.BatteryLoad)) {
            return;
        }
        MachineLosses m = new MachineLosses(AlternatorModel.build(c.spec()), c.load(), 25);
        LossPoint slow = m.steadyAt(speedRpm);
        LossPoint fast = m.steadyAt(1.2 * speedRpm);
        if (slow.temperatureSettled() && fast.temperatureSettled()) {
            assertTrue(fast.windingMeanC() >= slow.windingMeanC() - WindingTemperature.ACCURACY_K,
                    () -> "hotter when slower: " + slow + " vs " + fast);
        }
    }
}
