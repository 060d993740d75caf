package coilwright.conductor;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;

class CopperReferenceTest {
    private static final double M_PER_KFT = 304.8;

    @Test
    @DisplayName("IEC 60028: rho20 = 0.017241 Ohm*mm^2/m")
    void resistivity_at_20c_is_the_iec_60028_value() {
        assertEquals(0.017241, Copper.RESISTIVITY_20C_OHM_M * 1e6, 1e-6);
    }

    @Test
    @DisplayName("IEC 60028: R75/R20 = 1.2162")
    void resistance_ratio_75_to_20_is_1_2162() {
        assertEquals(1.2162, Copper.resistanceRatio(75.0), 1e-4);
    }

    @Test
    @DisplayName("AWG 18 copper at 20 C is 20.95 Ohm/km (ASTM B258 diameter, IEC 60028 resistivity)")
    void awg18_at_20c_is_about_20_95_ohm_per_km() {
        double r = Copper.resistanceOhm(1000.0, WireSpec.awg(18, 1).copperAreaM2(), 20.0);
        assertEquals(20.95, r, 0.01);
    }

    // source: NFPA 70 (NEC) Chapter 9 Table 8, DC resistance at 75 C of uncoated copper, solid conductors
    @ParameterizedTest(name = "AWG {0} solid at 75 C = {1} Ohm/kft")
    @CsvSource({"18, 7.77", "16, 4.89", "14, 3.07", "12, 1.93", "10, 1.21"})
    @DisplayName("solid copper at 75 C matches NEC Chapter 9 Table 8 within 1 %")
    void solid_copper_at_75c_matches_nec_table_8(int awg, double ohmPerKft) {
        double r = Copper.resistanceOhm(M_PER_KFT, WireSpec.awg(awg, 1).copperAreaM2(), 75.0);
        assertEquals(ohmPerKft, r, 0.01 * ohmPerKft);
    }
}
