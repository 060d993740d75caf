package coilwright.rewind;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class MeasurementsTest {

    @Test
    void default_accuracies_are_one_one_half_and_two_percent() {
        Measurements m = Measurements.of(24, 300, 40, 0.5, 20);
        assertEquals(1.0, m.voltageAccuracyPercent(), 0);
        assertEquals(1.0, m.speedAccuracyPercent(), 0);
        assertEquals(0.5, m.frequencyAccuracyPercent(), 0);
        assertEquals(2.0, m.resistanceAccuracyPercent(), 0);
    }

    @Test
    void implied_pole_count_is_120_f_over_n() {
        assertEquals(16.0, Measurements.of(24, 300, 40, 0, 20).impliedPoles(), 1e-12);
        assertEquals(4.0, Measurements.of(400, 1500, 50, 0, 20).impliedPoles(), 1e-12);
    }

    @Test
    void zero_frequency_and_resistance_mean_not_measured() {
        Measurements m = Measurements.of(24, 300, 0, 0, 20);
        assertFalse(m.hasFrequency());
        assertFalse(m.hasResistance());
        assertTrue(Measurements.of(24, 300, 40, 0.3, 20).hasResistance());
    }

    @Test
    void zero_negative_and_nan_readings_are_refused_naming_each_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new Measurements(0, -300, Double.NaN, -1, 400, 0, -1, 1, 1, 60));
        var fields = e.errors().stream().map(f -> f.field()).toList();
        assertEquals(java.util.List.of("openCircuitLineVoltageRmsV", "measuredSpeedRpm", "measuredFrequencyHz",
                "lineResistanceOhm", "measuredTemperatureC", "voltageAccuracyPercent", "resistanceAccuracyPercent"), fields);
        assertTrue(e.getMessage().contains("openCircuitLineVoltageRmsV = 0.0: must be > 0"), e.getMessage());
        assertTrue(e.getMessage().contains("measuredFrequencyHz = NaN: must be a finite number"), e.getMessage());
    }
}
