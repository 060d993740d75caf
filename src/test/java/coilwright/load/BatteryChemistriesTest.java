package coilwright.load;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class BatteryChemistriesTest {
    @Test
    void catalogue_lists_each_fixed_chemistry_with_ordered_voltages() {
        assertEquals(2, BatteryChemistries.all().size());
        for (BatteryChemistries.CellVoltages v : BatteryChemistries.all()) {
            assertTrue(v.nominalCellV() < v.floatCellV() && v.floatCellV() < v.absorbCellV(), v.toString());
            assertTrue(v.absorbMinCellV() <= v.absorbCellV() && v.absorbCellV() <= v.absorbMaxCellV(), v.toString());
            assertFalse(v.source().isBlank());
        }
    }

    @Test
    void custom_has_no_cell_voltages() {
        assertThrows(IllegalArgumentException.class, () -> BatteryChemistries.of(Chemistry.CUSTOM));
    }
}
