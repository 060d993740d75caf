package coilwright.thermal;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ConvectionReferenceTest {

    @Test
    @DisplayName("Air at 300 K: nu 15.89e-6 m2/s, k 26.3e-3 W/m K, Pr 0.707 (Incropera & DeWitt Table A.4)")
    void air_properties() {
        // source: Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.4 (from memory); exact at a node
        assertEquals(15.89e-6, Air.kinematicViscosityM2s(26.85), 1e-10);
        assertEquals(26.3e-3, Air.conductivityWPerMK(26.85), 1e-9);
        assertEquals(0.707, Air.prandtl(26.85), 1e-9);
        assertEquals(1.177, Air.densityKgM3(26.85), 0.002);
    }

    @Test
    @DisplayName("Churchill & Chu vertical plate within 10 % of McAdams' Nu = 0.59 Ra^1/4 in the laminar range")
    void vertical_plate_against_mcadams() {
        // source: McAdams (1954) laminar correlation for vertical plates, 1e4 < Ra < 1e9 (Incropera Table 9.1)
        double height = 0.2;
        double h = Convection.naturalVerticalPlateH(height, 65, 25);
        double ra = Convection.rayleigh(height, 65, 25);
        assertTrue(ra > 1e4 && ra < 1e9, "Ra " + ra);
        double mcAdams = 0.59 * Math.pow(ra, 0.25) * Air.conductivityWPerMK(45) / height;
        assertEquals(mcAdams, h, 0.10 * mcAdams);
    }

    @Test
    @DisplayName("Churchill & Chu horizontal cylinder within 10 % of Morgan's Nu = 0.48 Ra^1/4 (1e4 < Ra < 1e7)")
    void horizontal_cylinder_against_morgan() {
        // source: Morgan (1975), Incropera Table 9.1: C = 0.480, n = 0.250 for 1e4 < Ra_D < 1e7
        double d = 0.1;
        double h = Convection.naturalHorizontalCylinderH(d, 60, 20);
        double ra = Convection.rayleigh(d, 60, 20);
        assertTrue(ra > 1e4 && ra < 1e7, "Ra " + ra);
        double morgan = 0.48 * Math.pow(ra, 0.25) * Air.conductivityWPerMK(40) / d;
        assertEquals(morgan, h, 0.10 * morgan);
    }

    @Test
    @DisplayName("Becker & Kaye's three air-gap regimes join within 2 % at Ta = 1700 and 1e4 (the recalled constants are consistent)")
    void becker_kaye_regimes_join() {
        // source: Becker & Kaye (1962) as quoted by Staton & Cavagnino (2008) and Howey et al. (2012)
        assertEquals(2.0, 0.128 * Math.pow(1700, 0.367), 0.02 * 2.0);
        assertEquals(0.128 * Math.pow(1e4, 0.367), 0.409 * Math.pow(1e4, 0.241), 0.02 * 3.76);
        assertEquals(2.0, Convection.taylorCouetteNusselt(100), 0);
    }

    @Test
    @DisplayName("Cobb & Saunders' laminar disc within 10 % of laminar theory Nu = 0.33 Re^1/2 for air")
    void rotating_disc_against_laminar_theory() {
        // source: Millsaps & Pohlhausen (1952) similarity solution for an isothermal disc, Pr 0.71 (as quoted by
        // Owen & Rogers 1989; from memory); tolerance 10 %
        double r = 0.15;
        double omega = 30;
        double re = omega * r * r / Air.kinematicViscosityM2s(40);
        double theory = 0.33 * Math.sqrt(re) * Air.conductivityWPerMK(40) / r;
        assertEquals(theory, Convection.rotatingDiscH(r, omega, 40), 0.10 * theory);
    }

    @Test
    @DisplayName("Linearised radiation equals eps sigma (Ts^4 - Ta^4) / (Ts - Ta) (Incropera eq. 1.9)")
    void radiation_linearisation_is_exact() {
        // source: Incropera & DeWitt eq. 1.7 and 1.9
        double exact = 0.9 * Convection.STEFAN_BOLTZMANN * (Math.pow(353.15, 4) - Math.pow(298.15, 4)) / 55;
        assertEquals(exact, Convection.radiationH(0.9, 80, 25), 1e-12 * exact);
    }

    @Test
    @DisplayName("A painted housing 60 K above still air loses about 10 to 15 W/m2 K by natural convection and radiation")
    void housing_combined_coefficient() {
        // source: machine-design rule of thumb for totally enclosed frames in still air (from memory)
        double h = Convection.naturalHorizontalCylinderH(0.23, 85, 25) + Convection.radiationH(0.9, 85, 25);
        assertTrue(h > 10 && h < 15, "h = " + h);
    }

    @Test
    @DisplayName("Laminar flat plate: Nu = 0.664 Re^1/2 Pr^1/3 (Incropera eq. 7.30)")
    void flat_plate_laminar() {
        double re = 3 * 0.2 / Air.kinematicViscosityM2s(30);
        double expected = 0.664 * Math.sqrt(re) * Math.cbrt(Air.prandtl(30)) * Air.conductivityWPerMK(30) / 0.2;
        assertEquals(expected, Convection.flatPlateForcedH(0.2, 3, 30), 1e-12 * expected);
    }
}
