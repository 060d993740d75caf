package coilwright.magnet;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class GapFieldTest {

    @Test
    void looks_up_a_harmonic_by_order_and_refuses_an_unknown_order() {
        GapField f = GapFieldCalculator.solve(AxialDualRotorTest.sample(), 12, 0, 20);
        assertEquals(f.harmonicAmplitudes().get(2).amplitudeT(), f.amplitudeT(5), 0.0);
        assertEquals(5, f.harmonicAmplitudes().get(2).order());
        assertThrows(IllegalArgumentException.class, () -> f.amplitudeT(2));
        assertThrows(IllegalArgumentException.class, () -> f.amplitudeT(15));
    }

    @Test
    void lists_are_copied_and_unmodifiable() {
        List<String> warnings = new ArrayList<>(List.of("w"));
        GapField f = new GapField(1, 1, 1, 1, 1, 1, 1, 1, List.of(HarmonicAmplitude.of(1, 1)), 1, 1, 1, 1, 1, 1, "x",
                warnings);
        warnings.add("later");
        assertEquals(List.of("w"), f.warnings());
        assertThrows(UnsupportedOperationException.class, () -> f.warnings().add("no"));
    }
}
