package coilwright.losses;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class IronLossTest {
    private final CoreFlux flux = CoreFlux.of(CoreFluxTest.ROTOR, CoreFluxTest.STATOR, CoreFluxTest.CORE, 24,
            CoreFluxTest.FIELD);

    @Test
    void parts_add_up_to_teeth_plus_yoke() {
        IronLoss l = IronLoss.at(flux, CoreFluxTest.CORE, 20, 750);
        assertEquals(125.0, l.frequencyHz(), 1e-12);
        assertEquals(l.totalW(), l.hysteresisW() + l.eddyW() + l.excessW(), 1e-9);
        assertEquals(l.totalW(), l.toothW() + l.yokeW(), 1e-9);
    }

    @Test
    void loss_is_the_sheet_loss_times_mass_times_build_factor() {
        IronLoss l = IronLoss.at(flux, CoreFluxTest.CORE, 20, 750);
        ElectricalSteel s = CoreFluxTest.CORE.steel();
        double expected = 1.5 * (s.specificLoss(flux.toothMeanT(), 125).totalWPerKg() * flux.toothMassKg()
                + s.specificLoss(flux.yokeT(), 125).totalWPerKg() * flux.yokeMassKg());
        assertEquals(expected, l.totalW(), 1e-9 * expected);
    }

    @Test
    void no_loss_at_standstill_and_more_with_speed() {
        assertEquals(0, IronLoss.at(flux, CoreFluxTest.CORE, 20, 0).totalW());
        double slow = IronLoss.at(flux, CoreFluxTest.CORE, 20, 300).totalW();
        double fast = IronLoss.at(flux, CoreFluxTest.CORE, 20, 600).totalW();
        assertTrue(fast > 2 * slow, "eddy and excess parts grow faster than speed");
        assertTrue(fast < 4 * slow, "hysteresis grows only with speed");
    }

    @Test
    void frequencies_beyond_the_model_are_refused_naming_the_speed() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> IronLoss.at(flux, CoreFluxTest.CORE, 400, 2000));
        assertEquals("speedRpm", e.errors().get(0).field());
    }
}
