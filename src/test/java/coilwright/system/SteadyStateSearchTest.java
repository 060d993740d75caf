package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.conductor.Copper;
import coilwright.losses.ConductorEddyLoss;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.Connection;
import coilwright.magnet.AxialDualRotor;
import coilwright.thermal.WindingTemperature;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * The loss table's fixed points, searched from the evaluated curve's points by the secant method, are the bracketing
 * solve's fixed points: each lies within {@link WindingTemperature#ACCURACY_K} of the true one (the bracketing solve
 * to that accuracy, the secant search to a step of {@code ACCURACY_K / 10}), so the two differ by at most
 * {@code ACCURACY_K + ACCURACY_K / 10}; every loss then follows from the same operating point at that temperature.
 */
class SteadyStateSearchTest {
    private static final double SAME_FIXED_POINT_K = 1.1 * WindingTemperature.ACCURACY_K;

    private static void assertSameFixedPoint(LossPoint reference, LossPoint fast) {
        assertEquals(reference.temperatureSettled(), fast.temperatureSettled(), () -> reference + " vs " + fast);
        assertEquals(reference.speedRpm(), fast.speedRpm());
        assertEquals(reference.windingMeanC(), fast.windingMeanC(), SAME_FIXED_POINT_K, () -> reference + " vs " + fast);
        // the copper loss changes with the resistance, by about 0.4 % per kelvin (IEC 60028); the solver adds 1e-9
        double share = 0.004 * SAME_FIXED_POINT_K + 1e-9;
        assertEquals(reference.windingCopperLossW(), fast.windingCopperLossW(),
                share * Math.max(1e-9, reference.windingCopperLossW()), () -> reference + " vs " + fast);
        assertEquals(reference.shaftPowerW(), fast.shaftPowerW(), share * Math.max(1e-9, reference.shaftPowerW()),
                () -> reference + " vs " + fast);
    }

    private static void assertTableMatchesBracketedSolves(AlternatorEvaluation e, coilwright.load.Load load) {
        MachineLosses m = new MachineLosses(e.alternator(), load, e.heatAndLosses().ambientC());
        for (LossPoint p : e.heatAndLosses().points()) {
            assertSameFixedPoint(m.bracketedAt(p.speedRpm()), p);
        }
        assertSameFixedPoint(m.bracketedAt(e.heatAndLosses().rated().speedRpm()), e.heatAndLosses().rated());
    }

    @Test
    void every_point_of_the_sample_tables_is_the_bracketed_fixed_point() {
        assertTableMatchesBracketedSolves(HeatAssessmentTest.axial(), AlternatorEvaluatorTest.axial(600).load());
        for (Connection c : Connection.values()) {
            assertTableMatchesBracketedSolves(HeatAssessmentTest.radial(c), HeatAssessmentTest.battery12());
        }
    }

    @Property(tries = 30)
    void at_any_speed_the_search_finds_the_bracketed_fixed_point(
            @ForAll("cases") AlternatorEvaluatorPropertiesTest.Case c,
            @ForAll @DoubleRange(min = 0, max = 600) double speedRpm,
            @ForAll @DoubleRange(min = -40, max = 250) double startC) {
        Alternator alt = AlternatorModel.build(c.spec());
        if (speedRpm > MachineLosses.maxSpeedRpm(alt)) {
            return;
        }
        MachineLosses m = new MachineLosses(alt, c.load(), 25);
        assertSameFixedPoint(m.bracketedAt(speedRpm), m.steadyAt(speedRpm, startC));
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<AlternatorEvaluatorPropertiesTest.Case> cases() {
        return new AlternatorEvaluatorPropertiesTest().cases();
    }

    @Test
    void the_conductor_eddy_loss_scaled_with_the_speed_squared_is_the_integrated_one() {
        AlternatorEvaluation e = HeatAssessmentTest.axial();
        Alternator alt = e.alternator();
        AxialDualRotor r = (AxialDualRotor) alt.spec().rotor();
        for (LossPoint p : e.heatAndLosses().points()) {
            double integrated = ConductorEddyLoss.airCored(r, alt.spec().winding().poles(), alt.spec().magnetTempC(),
                    alt.spec().winding().slots(), alt.spec().turnsPerCoil(), alt.spec().wire().strandsInHand(),
                    alt.spec().wire().bareDiameterM(), p.speedRpm(), 20).totalW()
                    * Copper.resistanceRatio(20) / Copper.resistanceRatio(p.windingMeanC());
            // the integral does not depend on the speed: only rounding separates the two
            assertEquals(integrated, p.conductorEddyLossW(), 1e-12 * Math.max(1e-12, integrated), () -> "at " + p);
            assertTrue(p.speedRpm() == 0 || p.conductorEddyLossW() > 0);
        }
    }
}
