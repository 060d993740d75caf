package coilwright.thermal;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ThermalNetworkTest {

    @Test
    void series_and_parallel_conductances_by_hand() {
        ThermalNetwork n = new ThermalNetwork();
        int a = n.node("a");
        int b = n.node("b");
        n.link(a, b, 2.0).toAmbient(b, 4.0).toAmbient(a, 1.0);
        double[] t = n.solve(new double[]{10, 0}, 20);
        // a: 1 W/K to ambient in parallel with 2 and 4 W/K in series (4/3 W/K): 7/3 W/K
        assertEquals(20 + 10 / (7.0 / 3), t[0], 1e-12);
        assertEquals(10, n.heatToAmbientW(t, 20), 1e-12);
        assertEquals(20 + (t[0] - 20) * 2 / 6, t[1], 1e-12);
    }

    @Test
    void a_node_without_a_path_to_ambient_is_reported() {
        ThermalNetwork n = new ThermalNetwork();
        int a = n.node("a");
        int b = n.node("floating");
        n.toAmbient(a, 1.0);
        assertThrows(IllegalStateException.class, () -> n.solve(new double[]{1, 1}, 20));
        assertEquals(java.util.List.of("a", "floating"), n.names());
        assertTrue(b == 1);
    }

    @Test
    void negative_or_nan_conductance_is_refused() {
        ThermalNetwork n = new ThermalNetwork();
        int a = n.node("a");
        assertThrows(IllegalArgumentException.class, () -> n.toAmbient(a, -1));
        assertThrows(IllegalArgumentException.class, () -> n.toAmbient(a, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> n.solve(new double[]{1, 2}, 20));
    }
}
