package coilwright.conductor;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;

class WireSizeReferenceTest {

    // source: ASTM B258 table of standard nominal diameters of solid round wire (diameters in mm, rounded
    // to 0.001 mm as tabulated)
    @ParameterizedTest(name = "AWG {0} = {1} mm")
    @CsvSource({"10, 2.588", "14, 1.628", "18, 1.024", "20, 0.812", "30, 0.255", "36, 0.127", "40, 0.080"})
    @DisplayName("AWG diameters match the ASTM B258 table within 0.001 mm after rounding")
    void awg_diameters_match_astm_b258(int awg, double tableMm) {
        double mm = WireSize.awgDiameterM(awg) * 1000.0;
        assertEquals(tableMm, Math.round(mm * 1000.0) / 1000.0, 0.001 + 1e-9);
    }

    // source: IEC 60317-0-1 maximum overall diameters of enamelled round copper wire, as tabulated in the
    // OpenMagnetics MAS wire database (data/wires.ndjson); 1.000 mm grade 1 = 1.062 mm, grade 2 = 1.094 mm
    @ParameterizedTest(name = "{0} mm grade {1} -> {2} mm")
    @CsvSource({"1.000, 1, 1.062", "1.000, 2, 1.094", "0.500, 1, 0.544", "0.500, 2, 0.566", "2.000, 2, 2.112",
            "0.200, 1, 0.226"})
    @DisplayName("overall diameters at table sizes match IEC 60317-0-1 maxima")
    void overall_diameters_match_iec_60317(double bareMm, int grade, double overallMm) {
        assertEquals(overallMm, WireSize.overallDiameterM(bareMm / 1000.0, grade) * 1000.0, 1e-9);
    }
}
