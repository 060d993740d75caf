package coilwright.validation;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ChecksTest {

    @Test
    void collects_every_error_before_throwing() {
        Checks c = new Checks().positive("airGapM", -1.0).range("poleArcRatio", 1.5, 0.3, 1.0).positive("stackLengthM", 0.05);
        InvalidInputException e = assertThrows(InvalidInputException.class, c::throwIfAny);
        assertEquals(2, e.errors().size());
        assertEquals("airGapM = -1.0: must be > 0", e.errors().get(0).message());
        assertEquals("0.3 to 1.0", e.errors().get(1).allowed());
    }

    @Test
    void refuses_nan_and_infinity() {
        Checks c = new Checks().positive("a", Double.NaN).nonNegative("b", Double.POSITIVE_INFINITY);
        InvalidInputException e = assertThrows(InvalidInputException.class, c::throwIfAny);
        assertTrue(e.errors().get(0).message().contains("NaN"));
        assertTrue(e.errors().get(1).message().contains("finite"));
    }

    @Test
    void nested_errors_carry_their_path() {
        InvalidInputException inner = new InvalidInputException(new FieldError("airGapM", "-1.0", "airGapM = -1.0: must be > 0", "> 0"));
        FieldError e = inner.under("rotor").errors().get(0);
        assertEquals("rotor.airGapM", e.field());
        assertEquals("rotor.airGapM = -1.0: must be > 0", e.message());
    }

    @Test
    void passes_valid_values() {
        assertDoesNotThrow(() -> new Checks().positive("a", 1e-9).range("b", 0.3, 0.3, 1.0).intRange("c", 3, 1, 3).throwIfAny());
    }
}
