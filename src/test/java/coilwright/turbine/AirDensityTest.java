package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AirDensityTest {

    @Test
    void a_warmer_site_at_the_same_altitude_has_thinner_air() {
        assertTrue(AirDensity.isa(500, 30) < AirDensity.isa(500, 0));
    }

    @Test
    void density_uses_the_site_temperature_with_the_standard_pressure() {
        double rho = AirDensity.isa(1000, 25);
        double expected = AirDensity.pressurePa(1000) / (287.053 * 298.15);
        assertEquals(expected, rho, 1e-12);
    }

    @Test
    void standard_density_falls_with_altitude() {
        assertTrue(AirDensity.isaStandard(2000) < AirDensity.isaStandard(1000));
        assertTrue(AirDensity.isaStandard(-200) > AirDensity.isaStandard(0));
    }

    @Test
    void rejects_altitude_above_the_troposphere_and_names_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> AirDensity.isa(12_000, 15));
        assertEquals("altitudeM", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("-500.0 and 11000.0"), e.getMessage());
    }

    @Test
    void rejects_nan_temperature() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> AirDensity.isa(0, Double.NaN));
        assertEquals("temperatureC", e.errors().get(0).field());
    }
}
