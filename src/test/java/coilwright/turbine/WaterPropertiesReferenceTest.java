package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** Water viscosity and density against tabulated values (IAPWS 2008 viscosity; Tanaka et al. 2001 density; figures as printed in the CRC Handbook, from memory). */
class WaterPropertiesReferenceTest {

    @Test
    @DisplayName("Dynamic viscosity 1.0016 mPa s at 20 C and 1.3059 mPa s at 10 C within 0.5 % (IAPWS 2008)")
    void viscosity_matches_tables() {
        assertEquals(1.0016e-3, WaterProperties.dynamicViscosityPaS(20), 0.005 * 1.0016e-3);
        assertEquals(1.3059e-3, WaterProperties.dynamicViscosityPaS(10), 0.005 * 1.3059e-3);
    }

    @Test
    @DisplayName("Density 998.207 kg/m^3 at 20 C and 999.703 at 10 C (Tanaka et al., Metrologia 38, 2001)")
    void density_matches_tables() {
        assertEquals(998.207, WaterProperties.densityKgM3(20), 0.002);
        assertEquals(999.703, WaterProperties.densityKgM3(10), 0.002);
    }

    @Test
    void kinematic_viscosity_is_about_one_square_millimetre_per_second_at_20_c() {
        assertEquals(1.004e-6, WaterProperties.kinematicViscosityM2s(20), 0.01e-6);
    }

    @Test
    void rejects_frozen_or_hot_water() {
        assertEquals("waterTempC", assertThrows(InvalidInputException.class,
                () -> WaterProperties.dynamicViscosityPaS(-5)).errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> WaterProperties.densityKgM3(80));
    }
}
