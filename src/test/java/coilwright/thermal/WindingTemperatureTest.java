package coilwright.thermal;

import coilwright.conductor.Copper;
import org.junit.jupiter.api.Test;

import java.util.OptionalDouble;

import static org.junit.jupiter.api.Assertions.*;

class WindingTemperatureTest {
    private final ThermalModel model = ThermalModelsTest.DISC;
    private final CoolingConditions at250 = CoolingConditions.stillAir(250);

    @Test
    void fixed_losses_give_the_network_temperature() {
        CoupledTemperature c = WindingTemperature.solve(model, at250, t -> HeatSources.winding(180));
        assertTrue(c.settled());
        assertEquals(model.solve(at250, HeatSources.winding(180)).windingMeanC(), c.windingMeanC(),
                WindingTemperature.ACCURACY_K);
    }

    @Test
    void copper_loss_at_its_own_temperature_is_a_fixed_point_and_hotter_than_at_20_c() {
        double lossAt20 = 180;
        CoupledTemperature c = WindingTemperature.solve(model, at250,
                t -> HeatSources.winding(lossAt20 * Copper.resistanceRatio(t)));
        double check = model.solve(at250, HeatSources.winding(lossAt20 * Copper.resistanceRatio(c.windingMeanC())))
                .windingMeanC();
        assertEquals(c.windingMeanC(), check, 2 * WindingTemperature.ACCURACY_K);
        assertTrue(c.windingMeanC() > model.solve(at250, HeatSources.winding(lossAt20)).windingMeanC());
        assertEquals(lossAt20 * Copper.resistanceRatio(c.windingMeanC()), c.heat().windingW(), 1e-9);
        assertTrue(c.evaluations() < 20, "evaluations " + c.evaluations());
    }

    @Test
    void no_loss_leaves_the_winding_at_ambient() {
        CoupledTemperature c = WindingTemperature.solve(model, new CoolingConditions(0, 12, 0), t -> HeatSources.winding(0));
        assertEquals(12, c.windingMeanC(), 1e-9);
        assertTrue(c.settled());
    }

    @Test
    void a_hopeless_overload_is_reported_as_not_settling() {
        CoupledTemperature c = WindingTemperature.solve(model, at250, t -> HeatSources.winding(3000));
        assertFalse(c.settled());
        assertEquals(WindingTemperature.MAX_WINDING_C, c.windingMeanC());
    }

    @Test
    void the_insulation_limit_is_found_along_a_curve() {
        OptionalDouble at = InsulationLimit.firstCrossing(n -> 25 + 0.2 * n, 0, 1000, 155);
        assertEquals(650, at.orElseThrow(), 1000 * InsulationLimit.RELATIVE_ACCURACY);
        assertTrue(InsulationLimit.firstCrossing(n -> 25 + 0.01 * n, 0, 1000, 155).isEmpty());
        assertEquals(100, InsulationLimit.firstCrossing(n -> 200, 100, 1000, 155).orElseThrow());
        assertThrows(coilwright.validation.InvalidInputException.class,
                () -> InsulationLimit.firstCrossing(n -> n, 10, 5, 155));
    }
}
