package coilwright.losses;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WindageReferenceTest {
    private static final double RHO = 1.2;
    private static final double NU = 1.6e-5;

    @Test
    @DisplayName("Daily & Nece regime I equals the exact laminar Couette torque pi mu omega R^4 / s on both faces")
    void enclosed_disc_creeping_flow_is_couette() {
        // source: Daily & Nece 1960, C_M = 2 pi / (G Re) for merged laminar boundary layers, which is the exact
        // Couette solution; slow, tight case: R = 0.1 m, s = 0.5 mm, 10 rpm
        double omega = 10 * Math.PI / 30;
        double exact = Math.PI * RHO * NU * omega * Math.pow(0.1, 4) / 0.0005;
        assertEquals(exact, Windage.enclosedDiscTorqueNm(0.1, 0.0005, omega, RHO, NU), 1e-9 * exact);
    }

    @Test
    @DisplayName("Bilgen & Boulos (1973) at Re < 64 is within 3 % of the exact Couette torque 2 pi mu omega r^3 l / delta for delta/r = 0.005")
    void cylinder_creeping_flow_is_couette() {
        // source: Bilgen & Boulos, ASME J. Fluids Eng. 95, 1973; Couette flow between cylinders (exact, thin gap)
        double r = 0.1;
        double delta = 0.0005;
        double omega = 1.0; // Re = 0.1 * 0.0005 / 1.6e-5 = 3.1
        double exact = 2 * Math.PI * RHO * NU * omega * r * r * r * 0.1 / delta;
        assertEquals(exact, Windage.airGapCylinderTorqueNm(r, 0.1, delta, omega, RHO, NU), 0.03 * exact);
    }

    @Test
    @DisplayName("Free disc laminar C_M = 3.87 Re^-1/2 is 2 pi |G'(0)| with von Karman's G'(0) = -0.6159 (Cochran 1934)")
    void free_disc_laminar_coefficient() {
        // source: Cochran 1934 numerical solution of von Karman's rotating-disc equations, G'(0) = -0.6159
        // (Owen & Rogers 1989, vol. 1; from memory); tolerance 0.1 %
        double omega = 100;
        double r = 0.05; // Re = 100 * 0.0025 / 1.6e-5 = 15 625, laminar
        double re = omega * r * r / NU;
        double cm = Windage.freeDiscTorqueNm(r, omega, RHO, NU) / (0.5 * RHO * omega * omega * Math.pow(r, 5));
        assertEquals(2 * Math.PI * 0.6159 / Math.sqrt(re), cm, 0.001 * cm);
    }

    @Test
    void windage_is_zero_at_standstill_and_grows_with_speed() {
        assertEquals(0, Windage.freeDiscTorqueNm(0.2, 0, RHO, NU));
        assertEquals(0, Windage.enclosedDiscTorqueNm(0.2, 0.001, 0, RHO, NU));
        double previous = 0;
        for (double w = 1; w < 3000; w *= 1.5) {
            double t = Windage.freeDiscTorqueNm(0.2, w, RHO, NU) + Windage.enclosedDiscTorqueNm(0.2, 0.001, w, RHO, NU)
                    + Windage.airGapCylinderTorqueNm(0.2, 0.1, 0.001, w, RHO, NU);
            assertTrue(t > previous, "at " + w);
            previous = t;
        }
    }

    @Test
    void an_enclosure_never_drags_more_than_the_free_disc_far_from_its_walls() {
        double w = 300;
        assertTrue(Windage.enclosedDiscTorqueNm(0.2, 0.05, w, RHO, NU) < Windage.freeDiscTorqueNm(0.2, w, RHO, NU));
    }

    @Test
    void a_speed_so_small_its_reynolds_number_underflows_has_no_windage_rather_than_a_non_finite_one() {
        double tiny = Double.MIN_VALUE * 1e10;
        assertEquals(0, Windage.freeDiscTorqueNm(0.2, tiny, 1.2, 1.5e-5));
        assertEquals(0, Windage.enclosedDiscTorqueNm(0.2, 0.003, tiny, 1.2, 1.5e-5));
        assertEquals(0, Windage.airGapCylinderTorqueNm(0.07, 0.08, 0.001, tiny, 1.2, 1.5e-5));
    }

}
