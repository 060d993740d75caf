package coilwright.system;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class TorqueMatchTest {
    private static final double[] GRID = TorqueMatch.grid(1000.0, 100);

    @Test
    void a_falling_straight_line_is_matched_at_its_root() {
        // turbine 10 - 0.02 n against alternator 0.03 n: 10 = 0.05 n, n = 200
        double n = TorqueMatch.firstStableCrossingRpm(x -> 10 - 0.02 * x - 0.03 * x, GRID, 1000);
        assertEquals(200.0, n, 1e-8);
    }

    @Test
    void of_two_stable_crossings_the_one_reached_from_rest_is_chosen() {
        // R = (n-100)(n-300)(n-500) x -1e-6: + below 100, - 100..300, + 300..500, - above 500
        double n = TorqueMatch.firstStableCrossingRpm(x -> -1e-6 * (x - 100) * (x - 300) * (x - 500), GRID, 1000);
        assertEquals(100.0, n, 1e-8);
    }

    @Test
    void a_residual_still_positive_at_the_upper_speed_runs_to_it() {
        assertEquals(750.0, TorqueMatch.firstStableCrossingRpm(x -> 1.0, GRID, 750), 0.0);
    }

    @Test
    void a_turbine_without_starting_torque_stays_at_rest() {
        assertEquals(0.0, TorqueMatch.firstStableCrossingRpm(x -> -1.0 - x, GRID, 750), 0.0);
    }

    @Test
    void a_root_between_the_last_grid_speed_and_the_upper_bound_is_found() {
        double n = TorqueMatch.firstStableCrossingRpm(x -> 995.0 - x, GRID, 999.0);
        assertEquals(995.0, n, 1e-8);
    }

    @Test
    void the_grid_runs_evenly_from_zero_to_the_top() {
        double[] g = TorqueMatch.grid(90, 3);
        assertEquals(4, g.length);
        assertEquals(0.0, g[0], 0.0);
        assertEquals(60.0, g[2], 1e-12);
        assertEquals(90.0, g[3], 0.0);
    }

    @Test
    void bad_arguments_are_refused_by_name() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> TorqueMatch.firstStableCrossingRpm(x -> 1, GRID, -1));
        assertEquals("upperRpm", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> TorqueMatch.grid(0, 10));
    }

    @Test
    void a_residual_the_brent_solver_cannot_settle_is_a_typed_solver_failure() {
        // positive up to 100 rpm, negative from 200 rpm, undefined between: no root can be located
        coilwright.validation.SolverFailedException e = assertThrows(coilwright.validation.SolverFailedException.class,
                () -> TorqueMatch.firstStableCrossingRpm(x -> x <= 100 ? 1 : x >= 200 ? -1 : Double.NaN,
                        new double[] {0, 100, 200, 300}, 300));
        org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().contains("100.000 and 200.000 rpm"), e.getMessage());
    }
}
