package coilwright.turbine;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** Checks against the International Standard Atmosphere table (ICAO Doc 7488/3, 1993). */
class AirDensityReferenceTest {

    @Test
    @DisplayName("ISA sea level: 1.225 kg/m^3 at 15 C, 101325 Pa (ICAO Doc 7488)")
    void sea_level_density_is_1_225() {
        assertEquals(1.225, AirDensity.isaStandard(0), 0.0005);
        assertEquals(1.225, AirDensity.isa(0, 15), 0.0005);
        assertEquals(101_325.0, AirDensity.pressurePa(0), 1e-9);
    }

    @Test
    @DisplayName("ISA 1000 m: 1.1117 kg/m^3, 89875 Pa, 8.5 C (ICAO Doc 7488 table)")
    void density_at_1000_m() {
        assertEquals(1.1117, AirDensity.isaStandard(1000), 0.001);
        assertEquals(89_875, AirDensity.pressurePa(1000), 5);
        assertEquals(8.5, AirDensity.isaTemperatureC(1000), 1e-9);
    }

    @Test
    @DisplayName("ISA 3000 m: 0.9093 kg/m^3, 70109 Pa (ICAO Doc 7488 table)")
    void density_at_3000_m() {
        assertEquals(0.9093, AirDensity.isaStandard(3000), 0.001);
        assertEquals(70_109, AirDensity.pressurePa(3000), 10);
    }
}
