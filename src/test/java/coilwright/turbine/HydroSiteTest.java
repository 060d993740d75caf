package coilwright.turbine;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class HydroSiteTest {
    private final HydroSite site = new HydroSite(30, 0.01, List.of(
            new FlowDurationPoint(0.03, 0), new FlowDurationPoint(0.01, 50), new FlowDurationPoint(0.002, 100)));

    @Test
    void annual_energy_is_the_trapezoid_over_the_duration_curve() {
        // constant 1 kW all year gives 8760 kWh
        assertEquals(8760.0, site.annualEnergyKWh(q -> 1000), 1e-9);
        // 1 W per L/s: 30, 10 and 2 W; 8760 h x (0.5 x (30 + 10) x 0.5 + 0.5 x (10 + 2) x 0.5) / 1000
        double expected = 8760 * (0.5 * (30 + 10) * 0.5 + 0.5 * (10 + 2) * 0.5) / 1000;
        assertEquals(expected, site.annualEnergyKWh(q -> q * 1000), 1e-9);
    }

    @Test
    void annual_energy_without_a_curve_is_refused() {
        assertThrows(InfeasibleDesignException.class, () -> new HydroSite(30, 0.01).annualEnergyKWh(q -> 1));
    }

    @Test
    void rejects_negative_head_and_zero_flow() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new HydroSite(-10, 0));
        assertEquals("grossHeadM", e.errors().get(0).field());
        assertEquals("designFlowM3s", e.errors().get(1).field());
    }

    @Test
    void rejects_a_duration_curve_out_of_order() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new HydroSite(30, 0.01, List.of(
                new FlowDurationPoint(0.01, 10), new FlowDurationPoint(0.02, 5))));
        assertEquals("flowDuration[1].percentOfTime", e.errors().get(0).field());
        assertEquals("flowDuration[1].flowM3s", e.errors().get(1).field());
    }

    @Test
    void rejects_a_single_point_curve() {
        assertEquals("flowDuration", assertThrows(InvalidInputException.class,
                () -> new HydroSite(30, 0.01, List.of(new FlowDurationPoint(0.01, 10)))).errors().get(0).field());
    }
}
