package coilwright.validation;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TimeBudgetTest {
    @Test
    void without_an_open_budget_a_check_does_nothing() {
        assertDoesNotThrow(() -> TimeBudget.check("speedRange.points"));
    }

    @Test
    void a_spent_budget_stops_the_calculation_naming_the_field_and_closing_restores_the_outer_one() throws Exception {
        try (TimeBudget outer = TimeBudget.open(60_000)) {
            try (TimeBudget inner = TimeBudget.open(1)) {
                Thread.sleep(5);
                SolverFailedException e = assertThrows(SolverFailedException.class, () -> TimeBudget.check("speedRange.points"));
                assertEquals("speedRange.points", e.field());
                assertTrue(e.getMessage().contains("fewer points"), e.getMessage());
            }
            assertDoesNotThrow(() -> TimeBudget.check("x"), "the outer budget is not spent");
        }
        assertDoesNotThrow(() -> TimeBudget.check("x"));
    }
}
