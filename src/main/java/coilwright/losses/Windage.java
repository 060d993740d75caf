package coilwright.losses;

import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.validation.Checks;

/**
 * Air-friction (windage) torque of rotating discs and cylinders, from published moment coefficients. Torques are
 * in N m and always &gt;= 0; at the speeds of small wind and hydro alternators they are usually a few watts.
 */
public final class Windage {
    /** Below this Reynolds number the drag torque is negligible (under 1e-20 N m for any admitted size). */
    private static final double NEGLIGIBLE_REYNOLDS = 1e-12;

    /** Free-disc transition Reynolds number omega R^2 / nu (Owen &amp; Rogers, "Flow and Heat Transfer in Rotating-Disc
     *  Systems", vol. 1, 1989; about 3e5 in still air, from memory). */
    static final double FREE_DISC_TRANSITION_RE = 3e5;

    private Windage() {
    }

    /**
     * A disc rotating in an unbounded fluid, both faces wetted: M = 0.5 rho omega^2 R^5 C_M with
     * C_M = 3.87 Re^-1/2 (laminar; Cochran's 1934 solution of von Karman's 1921 equations) below Re = 3e5 and
     * C_M = 0.146 Re^-1/5 (turbulent; von Karman 1921) above, Re = omega R^2 / nu (as collected by Owen &amp;
     * Rogers 1989).
     *
     * @param radiusM                disc radius R, m, &gt; 0
     * @param omegaRadS              angular speed, rad/s, &gt;= 0
     * @param densityKgM3            air density, kg/m^3, &gt; 0
     * @param kinematicViscosityM2s  air kinematic viscosity, m^2/s, &gt; 0
     */
    public static double freeDiscTorqueNm(double radiusM, double omegaRadS, double densityKgM3,
                                          double kinematicViscosityM2s) {
        check(radiusM, omegaRadS, densityKgM3, kinematicViscosityM2s);
        if (omegaRadS == 0) {
            return 0;
        }
        double re = omegaRadS * radiusM * radiusM / kinematicViscosityM2s;
        if (re < NEGLIGIBLE_REYNOLDS) {
            return 0; // creeping flow: the torque is below 1e-20 N m (and C_M = C/Re would overflow)
        }
        double cm = re < FREE_DISC_TRANSITION_RE ? 3.87 / Math.sqrt(re) : 0.146 * Math.pow(re, -0.2);
        return 0.5 * densityKgM3 * omegaRadS * omegaRadS * Math.pow(radiusM, 5) * cm;
    }

    /**
     * A disc rotating in a close-fitting housing, both faces at axial clearance s: Daily &amp; Nece (ASME J. Basic Eng.
     * 82, 1960), M = 0.5 rho omega^2 R^5 C_M with G = s / R and the four flow regimes
     * I: 2 pi / (G Re) (laminar, merged boundary layers), II: 3.70 G^0.1 Re^-0.5 (laminar, separate),
     * III: 0.080 G^-1/6 Re^-0.25 (turbulent, merged), IV: 0.102 G^0.1 Re^-0.2 (turbulent, separate).
     * The regime boundaries are where the coefficients cross, so the largest of the four is taken (a common
     * engineering reading of their chart, slightly conservative in the transition).
     *
     * @param axialClearanceM clearance s between each face and the housing wall, m, &gt; 0
     */
    public static double enclosedDiscTorqueNm(double radiusM, double axialClearanceM, double omegaRadS,
                                              double densityKgM3, double kinematicViscosityM2s) {
        check(radiusM, omegaRadS, densityKgM3, kinematicViscosityM2s);
        new Checks().positive("axialClearanceM", axialClearanceM).throwIfAny();
        if (omegaRadS == 0) {
            return 0;
        }
        double re = omegaRadS * radiusM * radiusM / kinematicViscosityM2s;
        if (re < NEGLIGIBLE_REYNOLDS) {
            return 0; // creeping flow: the torque is below 1e-20 N m (and C_M = C/Re would overflow)
        }
        double g = axialClearanceM / radiusM;
        double laminar = Math.max(2 * Math.PI / (g * re), 3.70 * Math.pow(g, 0.1) / Math.sqrt(re));
        double turbulent = Math.max(0.080 * Math.pow(g, -1.0 / 6) * Math.pow(re, -0.25),
                0.102 * Math.pow(g, 0.1) * Math.pow(re, -0.2));
        double cm = Math.max(laminar, turbulent);
        return 0.5 * densityKgM3 * omegaRadS * omegaRadS * Math.pow(radiusM, 5) * cm;
    }

    /**
     * A cylinder rotating inside a stationary one across a radial gap delta: Bilgen &amp; Boulos (ASME J. Fluids Eng.
     * 95, 1973), T = C_M pi rho omega^2 r^4 l with Re = omega r delta / nu and
     * C_M = 10 (delta/r)^0.3 / Re (Re &lt; 64), 2 (delta/r)^0.3 Re^-0.6 (64 to 500), 1.03 (delta/r)^0.3 Re^-0.5
     * (500 to 1e4), 0.065 (delta/r)^0.3 Re^-0.2 (above 1e4) (as quoted by Saari, 1998, for high-speed machines).
     *
     * @param rotorRadiusM   rotor surface radius r, m, &gt; 0
     * @param lengthM        active length l, m, &gt; 0
     * @param radialGapM     radial gap delta, m, &gt; 0
     */
    public static double airGapCylinderTorqueNm(double rotorRadiusM, double lengthM, double radialGapM,
                                                double omegaRadS, double densityKgM3, double kinematicViscosityM2s) {
        check(rotorRadiusM, omegaRadS, densityKgM3, kinematicViscosityM2s);
        new Checks().positive("lengthM", lengthM).positive("radialGapM", radialGapM).throwIfAny();
        if (omegaRadS == 0) {
            return 0;
        }
        double re = omegaRadS * rotorRadiusM * radialGapM / kinematicViscosityM2s;
        if (re < NEGLIGIBLE_REYNOLDS) {
            return 0; // creeping flow: the torque is below 1e-20 N m (and C_M = C/Re would overflow)
        }
        double shape = Math.pow(radialGapM / rotorRadiusM, 0.3);
        double cm;
        if (re < 64) {
            cm = 10 * shape / re;
        } else if (re < 500) {
            cm = 2 * shape * Math.pow(re, -0.6);
        } else if (re < 1e4) {
            cm = 1.03 * shape * Math.pow(re, -0.5);
        } else {
            cm = 0.065 * shape * Math.pow(re, -0.2);
        }
        return cm * Math.PI * densityKgM3 * omegaRadS * omegaRadS * Math.pow(rotorRadiusM, 4) * lengthM;
    }

    /**
     * Windage of an axial dual rotor: each of the two discs has its outer face in open air (half a free disc) and its
     * inner face running at the running clearance past the stator (half an enclosed disc, Daily &amp; Nece).
     * Protruding magnets and bolt heads add drag not counted here.
     *
     * @param discRadiusM            outer radius of the steel discs, m
     * @param speedRpm               speed, rpm, &gt;= 0
     * @param densityKgM3            air density, kg/m^3
     * @param kinematicViscosityM2s  air kinematic viscosity, m^2/s
     */
    public static double axialDualRotorTorqueNm(AxialDualRotor rotor, double discRadiusM, double speedRpm,
                                                double densityKgM3, double kinematicViscosityM2s) {
        double w = omega(speedRpm);
        return 2 * (0.5 * freeDiscTorqueNm(discRadiusM, w, densityKgM3, kinematicViscosityM2s)
                + 0.5 * enclosedDiscTorqueNm(discRadiusM, rotor.clearancePerSideM(), w, densityKgM3,
                kinematicViscosityM2s));
    }

    /**
     * Windage of a radial rotor: the magnet surface in the air gap (Bilgen &amp; Boulos) and the two rotor ends as
     * free-disc faces.
     */
    public static double radialRotorTorqueNm(RadialSurfaceRotor rotor, double speedRpm, double densityKgM3,
                                             double kinematicViscosityM2s) {
        double w = omega(speedRpm);
        double r = rotor.magnetSurfaceRadiusM();
        return airGapCylinderTorqueNm(r, rotor.stackLengthM(), rotor.airGapM(), w, densityKgM3, kinematicViscosityM2s)
                + freeDiscTorqueNm(r, w, densityKgM3, kinematicViscosityM2s);
    }

    private static double omega(double speedRpm) {
        new Checks().range("speedRpm", speedRpm, 0, 100_000).throwIfAny();
        return speedRpm * Math.PI / 30;
    }

    private static void check(double radiusM, double omegaRadS, double densityKgM3, double nu) {
        new Checks().positive("radiusM", radiusM).nonNegative("omegaRadS", omegaRadS)
                .positive("densityKgM3", densityKgM3).positive("kinematicViscosityM2s", nu).throwIfAny();
    }
}
