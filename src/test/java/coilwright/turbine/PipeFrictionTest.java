package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class PipeFrictionTest {

    @Test
    void colebrook_solution_satisfies_the_equation() {
        double re = 3.3e5;
        double r = 2e-4;
        double f = PipeFriction.colebrook(re, r);
        double rhs = -2 * Math.log10(r / 3.7 + 2.51 / (re * Math.sqrt(f)));
        assertEquals(1 / Math.sqrt(f), rhs, 1e-10);
    }

    @Test
    void laminar_flow_uses_64_over_re() {
        assertEquals(64.0 / 1500, PipeFriction.darcy(1500, 0.001), 1e-15);
        assertEquals(PipeFriction.colebrook(5000, 0.001), PipeFriction.darcy(5000, 0.001), 1e-15);
    }

    @Test
    void rougher_pipe_has_more_friction() {
        assertTrue(PipeFriction.colebrook(1e6, 1e-3) > PipeFriction.colebrook(1e6, 1e-5));
    }

    @Test
    void rejects_laminar_re_for_colebrook_and_huge_roughness() {
        assertEquals("reynoldsNumber", assertThrows(InvalidInputException.class,
                () -> PipeFriction.colebrook(500, 0.001)).errors().get(0).field());
        assertEquals("relativeRoughness", assertThrows(InvalidInputException.class,
                () -> PipeFriction.swameeJain(1e5, 0.2)).errors().get(0).field());
    }
}
