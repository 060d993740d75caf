package coilwright.thermal;

import coilwright.machine.AirCoredStator;
import coilwright.magnet.AxialDualRotor;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** More heat never gives a cooler winding, nothing falls below ambient, and heat is conserved. */
class ThermalPropertiesTest {

    @Property(tries = 60)
    void disc_stator_temperature_rises_with_load(@ForAll @Scale(4) @DoubleRange(min = 0, max = 600) double rpm,
                                                 @ForAll @Scale(4) @DoubleRange(min = -20, max = 45) double ambient,
                                                 @ForAll @Scale(4) @DoubleRange(min = 1, max = 400) double heat,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.005, max = 0.03) double thick,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.1, max = 0.6) double fill) {
        DiscStatorThermal m = DiscStatorThermal.of(new AxialDualRotor("N42", 0.04, 0.05, 0.16, 0.01, thick, 0.0015),
                AirCoredStator.ofOpeningEnds(0.02, 0.024, 0.034), fill);
        check(m, new CoolingConditions(rpm, ambient, 0), heat);
    }

    @Property(tries = 60)
    void slotted_stator_temperature_rises_with_load(@ForAll @Scale(4) @DoubleRange(min = 0, max = 3000) double rpm,
                                                    @ForAll @Scale(4) @DoubleRange(min = -20, max = 45) double ambient,
                                                    @ForAll @Scale(4) @DoubleRange(min = 1, max = 400) double heat,
                                                    @ForAll @Scale(4) @DoubleRange(min = 0, max = 15) double wind,
                                                    @ForAll boolean enclosed) {
        check(ThermalModelsTest.housed(enclosed ? Enclosure.ENCLOSED : Enclosure.OPEN_VENTILATED),
                new CoolingConditions(rpm, ambient, wind), heat);
    }

    private static void check(ThermalModel m, CoolingConditions cc, double heat) {
        ThermalSolution low = m.solve(cc, new HeatSources(heat, heat / 5, 0, 1));
        ThermalSolution high = m.solve(cc, new HeatSources(heat * 1.2, heat / 5 * 1.2, 0, 1.2));
        assertTrue(high.windingMeanC() > low.windingMeanC(), low.windingMeanC() + " -> " + high.windingMeanC());
        assertTrue(high.magnetC() >= low.magnetC() - NetworkIteration.TOLERANCE_K * 10);
        low.nodes().forEach(n -> assertTrue(n.temperatureC() >= cc.ambientC() - 1e-9, n.toString()));
        assertTrue(Math.abs(low.heatOutW() - low.heatInW()) < 1e-3 * low.heatInW(), low.toString());
    }
}
