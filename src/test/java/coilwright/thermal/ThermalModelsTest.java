package coilwright.thermal;

import coilwright.machine.AirCoredStator;
import coilwright.machine.SlottedStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ThermalModelsTest {
    static final DiscStatorThermal DISC = DiscStatorThermal.of(
            new AxialDualRotor("N42", 0.04, 0.05, 0.16, 0.01, 0.018, 0.0015), AirCoredStator.ofOpeningEnds(0.022, 0.024, 0.034),
            0.45);
    static final RadialSurfaceRotor RADIAL = new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.14, 0.08, 0.001,
            0.004, 0.8, 0.0025);
    static final SlottedStator SLOTTED = new SlottedStator(0.024, 0.008, 0.0015, 0.0002, 0.006);

    static SlottedStatorThermal housed(Enclosure e) {
        return SlottedStatorThermal.of(RADIAL, SLOTTED, 24, 0.22, 0.015, e, 0.4);
    }

    @Test
    void heat_in_equals_heat_out_for_every_arrangement() {
        HeatSources heat = new HeatSources(150, 30, 5, 3);
        for (ThermalModel m : new ThermalModel[]{DISC, housed(Enclosure.OPEN_VENTILATED), housed(Enclosure.ENCLOSED),
                outer()}) {
            ThermalSolution s = m.solve(new CoolingConditions(300, 25, 0), heat);
            assertEquals(heat.totalW(), s.heatOutW(), 1e-3 * heat.totalW(), m.getClass().getSimpleName());
            assertTrue(s.windingHotSpotC() >= s.windingMeanC());
            assertTrue(s.windingMeanC() > 25);
            assertTrue(s.iterations() < NetworkIteration.MAX_PASSES);
        }
    }

    @Test
    void the_hot_spot_of_the_coil_layer_is_the_plane_wall_maximum() {
        // Incropera & DeWitt eq. 3.42: plane wall with uniform generation cooled on both faces: T_max - T_s = 1.5 (T_mean - T_s)
        ThermalSolution s = DISC.solve(CoolingConditions.stillAir(200), HeatSources.winding(200));
        double faces = s.temperatureC(DiscStatorThermal.FACES);
        assertEquals(1.5 * (s.windingMeanC() - faces), s.windingHotSpotC() - faces, 1e-9);
    }

    @Test
    void the_rotor_air_flow_cools_the_disc_stator() {
        double slow = DISC.solve(CoolingConditions.stillAir(50), HeatSources.winding(200)).windingMeanC();
        double fast = DISC.solve(CoolingConditions.stillAir(500), HeatSources.winding(200)).windingMeanC();
        assertTrue(fast < slow - 5, slow + " -> " + fast);
    }

    @Test
    void filled_resin_runs_cooler_than_plain_resin() {
        double plain = DISC.solve(CoolingConditions.stillAir(250), HeatSources.winding(200)).windingMeanC();
        double filled = DISC.withResinConductivityWPerMK(ThermalMaterials.FILLED_CASTING_RESIN)
                .solve(CoolingConditions.stillAir(250), HeatSources.winding(200)).windingMeanC();
        assertTrue(filled < plain);
    }

    @Test
    void an_enclosed_housing_runs_hotter_than_an_open_one_and_wind_on_it_helps() {
        HeatSources heat = new HeatSources(150, 30, 0, 2);
        double open = housed(Enclosure.OPEN_VENTILATED).solve(CoolingConditions.stillAir(750), heat).windingMeanC();
        double closed = housed(Enclosure.ENCLOSED).solve(CoolingConditions.stillAir(750), heat).windingMeanC();
        double windy = housed(Enclosure.ENCLOSED).solve(new CoolingConditions(750, 25, 8), heat).windingMeanC();
        assertTrue(closed > open, open + " vs " + closed);
        assertTrue(windy < closed - 5, closed + " -> " + windy);
    }

    @Test
    void magnets_run_cooler_than_the_winding_when_the_rotor_has_no_loss() {
        ThermalSolution s = housed(Enclosure.ENCLOSED).solve(CoolingConditions.stillAir(750), new HeatSources(150, 30, 0, 0));
        assertTrue(s.magnetC() < s.windingMeanC());
        assertEquals(s.magnetC(), s.temperatureC(SlottedStatorThermal.ROTOR));
    }

    @Test
    void ambient_shifts_every_temperature_nearly_one_for_one() {
        HeatSources heat = new HeatSources(100, 20, 0, 0);
        double cool = housed(Enclosure.ENCLOSED).solve(new CoolingConditions(500, 0, 0), heat).windingMeanC();
        double warm = housed(Enclosure.ENCLOSED).solve(new CoolingConditions(500, 40, 0), heat).windingMeanC();
        // the rise shrinks when warmer (radiation grows as T^3, air conducts better) but never reverses
        assertTrue(warm - cool > 25 && warm - cool < 40, "shift " + (warm - cool));
    }

    @Test
    void geometry_is_validated_with_field_names() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new DiscStatorThermal(0.14, 0.12,
                0.15, 0.1, 0.018, 0.0015, 0.1, 0.45, 0.2, 0.9));
        assertTrue(e.errors().stream().anyMatch(x -> x.field().equals("magnetOuterRadiusM")), e.errors().toString());
        InvalidInputException f = assertThrows(InvalidInputException.class, () -> new SlottedStatorThermal(
                RotorSide.INNER, 0.14, 0.08, 0.001, 24, 0.024, 0.008, 0.0015, 0.0002, 0.015, 0.01, 0.1, 0.05, 0.4,
                Enclosure.ENCLOSED, 0.9));
        assertEquals(2, f.errors().size(), f.errors().toString());
        assertThrows(InvalidInputException.class, () -> new CoolingConditions(100, 90, 0));
    }

    static SlottedStatorThermal outer() {
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.OUTER, "N42", 0.2, 0.05, 0.001, 0.004, 0.8, 0.002);
        return SlottedStatorThermal.of(r, new SlottedStator(0.02, 0.008, 0.001, 0.0002, 0.005), 36, 0.16, 0.012,
                Enclosure.OPEN_VENTILATED, 0.4);
    }
}
