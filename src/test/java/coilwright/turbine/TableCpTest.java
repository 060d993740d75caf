package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class TableCpTest {
    static final double[] LAMBDA = {1, 2, 3, 4, 5, 6, 7, 8, 9};
    static final double[] CP = {0.05, 0.14, 0.25, 0.34, 0.39, 0.40, 0.36, 0.25, 0.05};

    @Test
    void passes_through_its_points() {
        TableCp t = new TableCp(LAMBDA, CP);
        for (int i = 0; i < LAMBDA.length; i++) {
            assertEquals(CP[i], t.cp(LAMBDA[i]), 1e-12);
        }
    }

    @Test
    void finds_the_optimum_between_points() {
        TableCp t = new TableCp(LAMBDA, CP);
        double opt = t.optimumTipSpeedRatio();
        assertTrue(opt > 5.0 && opt < 6.5, "opt " + opt);
        assertTrue(t.maxCp() >= 0.40 - 1e-12 && t.maxCp() <= 0.42, "max " + t.maxCp());
    }

    @Test
    void is_zero_beyond_the_last_point_and_runaway_is_the_last_point_when_cp_stays_positive() {
        TableCp t = new TableCp(LAMBDA, CP);
        assertEquals(0.0, t.cp(9.5));
        assertEquals(9.0, t.runawayTipSpeedRatio(), 1e-12);
    }

    @Test
    void runaway_is_where_a_table_reaches_zero() {
        TableCp t = new TableCp(new double[] {0, 3, 6, 8, 10}, new double[] {0, 0.2, 0.4, 0.2, 0});
        assertEquals(10.0, t.runawayTipSpeedRatio(), 1e-6);
    }

    @Test
    void a_short_table_is_linear_and_starts_on_a_line_from_the_origin() {
        TableCp t = new TableCp(new double[] {2, 6, 9}, new double[] {0.1, 0.4, 0.0});
        assertEquals(0.25, t.cp(4.0), 1e-12);
        assertEquals(0.05, t.cp(1.0), 1e-12);
        assertEquals(0.05, t.torqueCoefficient(0.0), 1e-12);
        assertEquals(6.0, t.optimumTipSpeedRatio(), 1e-3);
    }

    @Test
    void a_table_from_zero_has_a_finite_starting_torque() {
        TableCp t = new TableCp(new double[] {0, 3, 6, 8, 10}, new double[] {0, 0.2, 0.4, 0.2, 0});
        double cq0 = t.torqueCoefficient(0.0);
        assertTrue(cq0 > 0.01 && cq0 < 0.2, "cq0 " + cq0);
    }

    @Test
    void rejects_cp_above_betz_with_the_point_named() {
        double[] cp = CP.clone();
        cp[3] = 0.61;
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new TableCp(LAMBDA, cp));
        assertEquals("cpTable[3].cp", e.errors().get(0).field());
        assertEquals("cpTable[3].cp = 0.61: must be <= 0.5926 (Betz limit)", e.errors().get(0).message());
    }

    @Test
    void rejects_tip_speed_ratios_out_of_order() {
        double[] lambda = LAMBDA.clone();
        lambda[4] = 3.5;
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new TableCp(lambda, CP));
        assertEquals("cpTable[4].tipSpeedRatio", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("strictly increasing"), e.getMessage());
    }

    @Test
    void rejects_too_few_points_mismatched_lengths_and_negative_cp() {
        assertEquals("cpTable", assertThrows(InvalidInputException.class,
                () -> new TableCp(new double[] {1, 2}, new double[] {0.1, 0.2})).errors().get(0).field());
        assertEquals("cpTable", assertThrows(InvalidInputException.class,
                () -> new TableCp(new double[] {1, 2, 3}, new double[] {0.1, 0.2})).errors().get(0).field());
        assertEquals("cpTable[1].cp", assertThrows(InvalidInputException.class,
                () -> new TableCp(new double[] {1, 2, 3}, new double[] {0.1, -0.2, 0.1})).errors().get(0).field());
    }

    @Test
    void copies_its_arrays_and_compares_by_content() {
        double[] lambda = LAMBDA.clone();
        TableCp t = new TableCp(lambda, CP);
        lambda[0] = 100;
        assertEquals(1.0, t.tipSpeedRatios()[0]);
        assertEquals(new TableCp(LAMBDA, CP), t);
        assertEquals(new TableCp(LAMBDA, CP).hashCode(), t.hashCode());
    }

    @Test
    void a_table_falling_from_its_first_point_peaks_there() {
        TableCp t = new TableCp(new double[] {4, 6, 8, 10, 12}, new double[] {0.4, 0.3, 0.2, 0.1, 0.05});
        assertEquals(4.0, t.optimumTipSpeedRatio(), 1e-6);
        assertEquals(0.4, t.maxCp(), 1e-9);
        assertEquals(12.0, t.runawayTipSpeedRatio(), 1e-12);
    }
}
