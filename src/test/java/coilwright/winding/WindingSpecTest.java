package coilwright.winding;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class WindingSpecTest {

    static FieldError onlyError(Runnable r) {
        InvalidInputException e = assertThrows(InvalidInputException.class, r::run);
        assertEquals(1, e.errors().size(), e.getMessage());
        return e.errors().get(0);
    }

    @Test
    void zero_slots_is_refused_with_the_allowed_range() {
        FieldError e = onlyError(() -> new WindingSpec(0, 10, 3, Layers.DOUBLE, 0, 1, 0));
        assertEquals("slots", e.field());
        assertEquals("slots = 0: must be between 2 and 400", e.message());
    }

    @Test
    void an_odd_pole_count_is_refused() {
        FieldError e = onlyError(() -> new WindingSpec(12, 7, 3, Layers.DOUBLE, 0, 1, 0));
        assertEquals("poles", e.field());
        assertTrue(e.message().startsWith("poles = 7: must be even"), e.message());
        assertEquals("even, 2 to 400", e.allowed());
    }

    @Test
    void zero_phases_is_refused_naming_one_or_three() {
        FieldError e = onlyError(() -> new WindingSpec(12, 10, 0, Layers.DOUBLE, 0, 1, 0));
        assertEquals("phases = 0: must be 1 or 3", e.message());
        assertEquals("1 or 3", e.allowed());
    }

    @Test
    void a_nan_skew_is_refused() {
        FieldError e = onlyError(() -> new WindingSpec(12, 10, 3, Layers.DOUBLE, 0, 1, Double.NaN));
        assertEquals("skewSlotPitches", e.field());
        assertTrue(e.message().contains("finite"), e.message());
        assertEquals("0.0 to 2.0", e.allowed());
    }

    @Test
    void a_skew_beyond_two_slot_pitches_is_refused() {
        assertEquals("skewSlotPitches", onlyError(() -> new WindingSpec(12, 10, 3, Layers.DOUBLE, 0, 1, 2.5)).field());
    }

    @Test
    void a_negative_pitch_or_one_beyond_half_the_slots_is_refused() {
        FieldError negative = onlyError(() -> new WindingSpec(12, 10, 3, Layers.DOUBLE, -1, 1, 0));
        assertEquals("coilPitchSlots", negative.field());
        assertEquals("0 or 1 to 6", negative.allowed());
        FieldError tooLong = onlyError(() -> new WindingSpec(12, 10, 3, Layers.DOUBLE, 7, 1, 0));
        assertEquals("coilPitchSlots = 7: must be 0 (automatic) or 1 to 6 (half the slots)", tooLong.message());
    }

    @Test
    void zero_parallel_paths_are_refused() {
        FieldError e = onlyError(() -> new WindingSpec(12, 10, 3, Layers.DOUBLE, 0, 0, 0));
        assertEquals("parallelPaths", e.field());
        assertEquals("1 to 12", e.allowed());
    }

    @Test
    void a_missing_layer_choice_is_refused() {
        assertEquals("layers", onlyError(() -> new WindingSpec(12, 10, 3, null, 0, 1, 0)).field());
    }

    @Test
    void every_invalid_field_is_reported_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new WindingSpec(0, 7, 0, null, -1, 0, Double.NaN));
        List<String> fields = e.errors().stream().map(FieldError::field).toList();
        assertEquals(List.of("slots", "poles", "phases", "layers", "coilPitchSlots", "parallelPaths",
                "skewSlotPitches"), fields);
    }

    @Test
    void copies_change_one_field_and_keep_the_rest() {
        WindingSpec s = WindingSpec.of(24, 4, 3, Layers.DOUBLE);
        assertEquals(2, s.polePairs());
        WindingSpec t = s.withCoilPitchSlots(5).withParallelPaths(2).withSkewSlotPitches(0.5)
                .withLayers(Layers.SINGLE).withPoles(8);
        assertEquals(new WindingSpec(24, 8, 3, Layers.SINGLE, 5, 2, 0.5), t);
        assertThrows(InvalidInputException.class, () -> s.withPoles(5));
    }
}
