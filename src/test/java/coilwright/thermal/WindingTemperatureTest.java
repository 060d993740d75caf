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

    @Test
    void the_secant_search_finds_the_bracketed_fixed_point_from_any_start_with_fewer_evaluations() {
        java.util.function.DoubleFunction<HeatSources> copper = t -> HeatSources.winding(180 * Copper.resistanceRatio(t));
        CoupledTemperature reference = WindingTemperature.solve(model, at250, copper);
        for (double start : new double[]{-40, 25, 60, reference.windingMeanC(), 150, WindingTemperature.MAX_WINDING_C}) {
            CoupledTemperature c = WindingTemperature.solveNear(model, at250, copper, start);
            assertTrue(c.settled());
            // each within ACCURACY_K of the fixed point (the secant to a tenth of it)
            assertEquals(reference.windingMeanC(), c.windingMeanC(), 1.1 * WindingTemperature.ACCURACY_K, "from " + start);
            assertEquals(180 * Copper.resistanceRatio(c.windingMeanC()), c.heat().windingW(), 1e-9);
            assertEquals(model.solve(at250, c.heat()).windingMeanC(), c.solution().windingMeanC(), 1e-12);
            assertTrue(c.evaluations() < reference.evaluations(), c.evaluations() + " vs " + reference.evaluations());
        }
    }

    @Test
    void the_secant_search_falls_back_to_the_bracketing_solve_for_no_loss_and_for_runaway() {
        CoupledTemperature none = WindingTemperature.solveNear(model, new CoolingConditions(0, 12, 0),
                t -> HeatSources.winding(0), 80);
        assertEquals(12, none.windingMeanC(), WindingTemperature.ACCURACY_K);
        assertTrue(none.settled());
        CoupledTemperature runaway = WindingTemperature.solveNear(model, at250, t -> HeatSources.winding(3000), 80);
        assertFalse(runaway.settled());
        assertEquals(WindingTemperature.MAX_WINDING_C, runaway.windingMeanC());
    }
}
