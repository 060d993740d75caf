package coilwright.rewind;

import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class ExistingMachineTest {
    static final WireSpec AWG14 = WireSpec.awg(14, 2);

    static ExistingMachine machine(int poles, Measurements m) {
        return new ExistingMachine(12, poles, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 36, AWG14, null, m);
    }

    @Test
    void pole_count_is_inferred_from_frequency_and_speed_when_unknown() {
        ExistingMachine m = machine(0, Measurements.of(24, 300, 40, 0, 20));
        assertEquals(16, m.polesUsed());
        assertEquals(16, m.windingSpec().poles());
    }

    @Test
    void a_given_pole_count_that_fits_the_frequency_is_kept() {
        assertEquals(16, machine(16, Measurements.of(24, 300, 40.2, 0, 20)).polesUsed());
    }

    @Test
    void a_pole_count_that_does_not_fit_frequency_and_speed_is_refused_naming_both() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> machine(12, Measurements.of(24, 300, 40, 0, 20)));
        FieldError f = e.errors().get(0);
        assertEquals("poles", f.field());
        assertTrue(f.message().startsWith("poles = 12: does not fit the measured 40.0 Hz at 300 rpm, which implies"
                + " 16 poles"), f.message());
        assertEquals("16 from the frequency", f.allowed());
    }

    @Test
    void a_frequency_giving_no_even_pole_count_is_refused() {
        // 120 * 37 / 300 = 14.8 poles: neither 14 nor 16 within 1.5 %
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> machine(0, Measurements.of(24, 300, 37, 0, 20)));
        assertEquals("measurements.measuredFrequencyHz", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("14.80 poles"), e.getMessage());
    }

    @Test
    void accuracies_too_loose_to_tell_the_pole_count_are_refused() {
        Measurements loose = new Measurements(24, 300, 100, 0, 20, 0, 1, 5, 5, 2); // 40 poles +- 4
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> machine(0, loose));
        assertTrue(e.getMessage().contains("more than one even pole count"), e.getMessage());
    }

    @Test
    void unknown_poles_without_a_frequency_are_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> machine(0, Measurements.of(24, 300, 0, 0, 20)));
        assertEquals("poles", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("no measurements.measuredFrequencyHz"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> machine(0, null));
    }

    @Test
    void every_bad_field_is_reported_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new ExistingMachine(1, 7, 2,
                null, 0, null, -1, 0, 0, null, null, null));
        List<String> fields = e.errors().stream().map(FieldError::field).toList();
        assertTrue(fields.containsAll(List.of("slots", "poles", "phases", "layers", "connection", "wire",
                "coilsPerPhase", "parallelPaths", "turnsPerCoil")), fields.toString());
    }

    @Test
    void single_phase_delta_is_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new ExistingMachine(8, 8, 1,
                Layers.DOUBLE, 0, Connection.DELTA, 0, 1, 50, AWG14, null, null));
        assertEquals("connection", e.errors().get(0).field());
    }

    @Test
    void measurements_and_window_are_optional() {
        ExistingMachine m = machine(16, null);
        assertTrue(m.measurementsIfTaken().isEmpty());
        assertTrue(m.coilWindowIfKnown().isEmpty());
    }
}
