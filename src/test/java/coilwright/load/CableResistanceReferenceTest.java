package coilwright.load;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

class CableResistanceReferenceTest {
    @Test
    @DisplayName("copper: rho20 = 0.017241 Ohm*mm^2/m and R75/R20 = 1.2162 (IEC 60028)")
    void copper_resistivity_matches_iec_60028() {
        assertEquals(0.017241e-6, CableResistance.copperResistivityOhmM(20), 5e-5 * 0.017241e-6);
        assertEquals(1.2162, CableResistance.copperResistivityOhmM(75) / CableResistance.copperResistivityOhmM(20), 1e-4);
    }
}
