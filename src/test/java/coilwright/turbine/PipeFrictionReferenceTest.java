package coilwright.turbine;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** Pipe friction against published figures. */
class PipeFrictionReferenceTest {

    @Test
    @DisplayName("Moody chart standard point: Re = 1e5, eps/D = 0.001 gives f = 0.0222 (Colebrook 1939; Moody 1944)")
    void moody_chart_point() {
        assertEquals(0.0222, PipeFriction.colebrook(1e5, 0.001), 0.0002);
    }

    @Test
    @DisplayName("Smooth pipe: f = 0.0180 at Re 1e5 and 0.0116 at Re 1e6 (Prandtl smooth-pipe law, Moody chart)")
    void smooth_pipe_points() {
        assertEquals(0.0180, PipeFriction.colebrook(1e5, 0), 0.0002);
        assertEquals(0.0116, PipeFriction.colebrook(1e6, 0), 0.0002);
    }

    @Test
    @DisplayName("White, Fluid Mechanics, Example 6.6 (from memory): oil 0.2 m3/s, nu 1e-5 m2/s, 500 m of 200 mm cast iron: Re 127300, f 0.0227, hf 117 m")
    void white_cast_iron_oil_example() {
        PenstockSpec spec = new PenstockSpec(500, 0.2, 0.26e-3, 100, 0);
        double v = 0.2 / spec.boreAreaM2();
        double re = v * 0.2 / 1e-5;
        assertEquals(127_300, re, 100);
        double f = PipeFriction.colebrook(re, spec.relativeRoughness());
        assertEquals(0.0227, f, 0.0002);
        double hf = f * 500 / 0.2 * v * v / (2 * WaterProperties.GRAVITY_MS2);
        assertEquals(117, hf, 1.5);
    }

    @Test
    @DisplayName("Swamee-Jain within 3 % of Colebrook over 1e-6..1e-2 and Re 5e3..1e8 (Swamee & Jain 1976 claim about 1 %; 2.8 % worst at Re 5000, eps/D 0.01)")
    void swamee_jain_agrees_with_colebrook() {
        for (double re : new double[] {5e3, 1e4, 1e5, 1e6, 1e7, 1e8}) {
            for (double r : new double[] {1e-6, 1e-5, 1e-4, 1e-3, 1e-2}) {
                double cb = PipeFriction.colebrook(re, r);
                assertEquals(cb, PipeFriction.swameeJain(re, r), 0.03 * cb, "Re " + re + " eps/D " + r);
            }
        }
        double cb = PipeFriction.colebrook(1e6, 1e-4);
        assertEquals(cb, PipeFriction.swameeJain(1e6, 1e-4), 0.01 * cb);
    }

    @Test
    @DisplayName("Hazen-Williams (C 150) and Darcy-Weisbach agree within 15 % for a smooth PVC pipe carrying cool water (known agreement range, common practice)")
    void hazen_williams_cross_check_for_pvc() {
        for (double q : new double[] {0.005, 0.01, 0.02}) {
            Penstock p = new Penstock(PenstockSpec.of(100, 0.1, PipeMaterial.PVC, 0));
            double dw = p.frictionLossM(q, 15);
            assertEquals(dw, p.hazenWilliamsLossM(q), 0.15 * dw, "Q " + q);
        }
    }
}
