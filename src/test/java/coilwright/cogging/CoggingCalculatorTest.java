package coilwright.cogging;

import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CoggingCalculatorTest {
    static final RadialSurfaceRotor ROTOR = new RadialSurfaceRotor(RotorSide.INNER, "N42", 0.1, 0.08, 0.001, 0.005,
            0.75, 0.0025);
    static final CoggingInput MOTOR = CoggingInput.of(ROTOR, WindingSpec.of(36, 12, 3, Layers.SINGLE), 20);

    @Test
    void air_cored_stators_have_none_and_say_why() {
        CoggingTorque c = CoggingCalculator.airCored();
        assertEquals(0, c.peakToPeakNm());
        assertEquals(0, c.cyclesPerRevolution());
        assertTrue(c.note().contains("air-cored"));
        assertEquals(0, c.torqueNm(0.3));
    }

    @Test
    void closed_slots_have_none() {
        CoggingInput closed = CoggingInput.of(new RadialSurfaceRotor(RotorSide.INNER, "N42", 0.1, 0.08, 0.001, 0.005,
                0.75, 0.0), WindingSpec.of(36, 12, 3, Layers.SINGLE), 20);
        assertEquals(0, CoggingCalculator.radial(closed).peakToPeakNm());
    }

    @Test
    void period_is_the_lcm_of_slots_and_poles_and_peak_is_half_the_swing_for_an_odd_waveform() {
        CoggingTorque c = CoggingCalculator.radial(MOTOR);
        assertEquals(36, c.cyclesPerRevolution());
        assertEquals(10.0, c.periodDeg(), 1e-12);
        assertEquals(36, c.harmonics().get(0).cyclesPerRevolution());
        assertEquals(c.peakToPeakNm() / 2, c.peakNm(), 1e-9 * c.peakNm());
        assertTrue(c.peakToPeakNm() > 0);
    }

    @Test
    void the_harmonics_reproduce_the_field_torque_between_computed_positions() {
        SubdomainField f = CoggingCalculator.field(MOTOR);
        CoggingTorque c = CoggingCalculator.radial(MOTOR);
        double angle = 2 * Math.PI / 36 * 0.3141;
        double direct = CoggingCalculator.unskewedTorqueNm(MOTOR, f, angle);
        assertEquals(direct, c.torqueNm(angle), 1e-3 * c.peakNm());
    }

    @Test
    void skew_multiplies_each_harmonic_by_its_factor() {
        CoggingTorque plain = CoggingCalculator.radial(MOTOR);
        CoggingTorque skewed = CoggingCalculator.radial(MOTOR.withSkewSlotPitches(0.5));
        CoggingHarmonic first = skewed.harmonics().get(0);
        double x = 36 * (0.5 * 2 * Math.PI / 36) / 2;
        assertEquals(Math.sin(x) / x, first.skewFactor(), 1e-12);
        assertEquals(plain.harmonics().get(0).amplitudeNm() * first.skewFactor(), first.amplitudeNm(), 1e-12);
        assertTrue(skewed.peakToPeakNm() < plain.peakToPeakNm());
    }

    @Test
    void cogging_scales_with_stack_length_and_with_remanence_squared() {
        double base = CoggingCalculator.radial(MOTOR).peakToPeakNm();
        CoggingInput longer = new CoggingInput(36, 12, RotorSide.INNER, 0.1, 0.16, 0.001, 0.005, 0.75, 0.0025,
                MOTOR.remanenceT(), MOTOR.recoilPermeability(), 0);
        CoggingInput weaker = new CoggingInput(36, 12, RotorSide.INNER, 0.1, 0.08, 0.001, 0.005, 0.75, 0.0025,
                MOTOR.remanenceT() / 2, MOTOR.recoilPermeability(), 0);
        assertEquals(2 * base, CoggingCalculator.radial(longer).peakToPeakNm(), 1e-9 * base);
        assertEquals(base / 4, CoggingCalculator.radial(weaker).peakToPeakNm(), 1e-9 * base);
    }

    @Test
    void an_outer_rotor_works_too() {
        CoggingInput outer = CoggingInput.of(new RadialSurfaceRotor(RotorSide.OUTER, "N42", 0.1, 0.05, 0.001, 0.004,
                0.8, 0.002), WindingSpec.of(24, 20, 3, Layers.DOUBLE), 20);
        CoggingTorque c = CoggingCalculator.radial(outer);
        assertEquals(120, c.cyclesPerRevolution());
        assertTrue(c.peakToPeakNm() > 0 && Double.isFinite(c.peakToPeakNm()));
    }

    @Test
    void inputs_are_validated() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new CoggingInput(1, 3, null, 0, 0,
                0, 0, 0, 0, 0, 0, 3));
        assertTrue(e.errors().size() >= 10, e.errors().toString());
        assertThrows(InvalidInputException.class, () -> new CoggingInput(36, 12, RotorSide.INNER, 0.1, 0.08, 0.001,
                0.005, 0.75, 0.009, 1.2, 1.05, 0), "opening wider than the slot pitch");
    }
}
