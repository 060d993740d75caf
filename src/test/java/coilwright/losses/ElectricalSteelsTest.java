package coilwright.losses;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ElectricalSteelsTest {

    @Test
    void every_grade_has_positive_hysteresis_and_excess_and_a_plausible_exponent() {
        for (ElectricalSteel s : ElectricalSteels.all()) {
            assertTrue(s.hysteresisCoefficient() > 0, s.name());
            assertTrue(s.excessCoefficient() > 0, s.name());
            assertTrue(s.hysteresisExponent() > 1.6 && s.hysteresisExponent() < 3.0, s.name());
        }
    }

    @Test
    void excess_equals_classical_eddy_loss_at_1_5_tesla_50_hertz() {
        ElectricalSteel.SpecificLoss l = ElectricalSteels.byName("M400-50A").specificLoss(1.5, 50);
        assertEquals(l.eddyWPerKg(), l.excessWPerKg(), 1e-12);
    }

    @Test
    void classical_eddy_coefficient_follows_the_sheet_thickness_squared() {
        ElectricalSteel thin = ElectricalSteel.fromGuaranteedLosses("a", 0.35e-3, 7700, 0.4e-6, 4, 1.7, "test");
        ElectricalSteel thick = ElectricalSteel.fromGuaranteedLosses("b", 0.70e-3, 7700, 0.4e-6, 8, 3.4, "test");
        assertEquals(4.0, thick.classicalCoefficient() / thin.classicalCoefficient(), 1e-12);
    }

    @Test
    void unknown_motor_lamination_is_worse_than_every_listed_grade() {
        double unknown = ElectricalSteels.byName(ElectricalSteels.UNKNOWN_MOTOR_LAMINATION).specificLoss(1.5, 50)
                .totalWPerKg();
        for (ElectricalSteel s : ElectricalSteels.all()) {
            assertTrue(s.specificLoss(1.5, 50).totalWPerKg() <= unknown, s.name());
        }
    }

    @Test
    void names_are_found_ignoring_case_and_an_unknown_name_lists_the_allowed_ones() {
        assertEquals("M400-50A", ElectricalSteels.byName(" m400-50a ").name());
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ElectricalSteels.byName("M999"));
        assertEquals("steelName", e.errors().get(0).field());
        assertTrue(e.errors().get(0).message().contains("M270-35A"));
    }

    @Test
    void loss_is_zero_at_zero_frequency_or_flux_and_refuses_out_of_range_inputs() {
        ElectricalSteel s = ElectricalSteels.byName("M530-50A");
        assertEquals(0, s.specificLoss(1.5, 0).totalWPerKg());
        assertEquals(0, s.specificLoss(0, 50).totalWPerKg());
        assertThrows(InvalidInputException.class, () -> s.specificLoss(2.5, 50));
        assertThrows(InvalidInputException.class, () -> s.specificLoss(1.0, Double.NaN));
    }

    @Test
    void figures_that_leave_no_hysteresis_are_refused() {
        assertThrows(IllegalArgumentException.class,
                () -> ElectricalSteel.fromGuaranteedLosses("x", 2e-3, 7700, 0.1e-6, 1.0, 0.5, "test"));
    }
}
