package coilwright.thermal;

import coilwright.validation.Checks;

/**
 * Heat-transfer coefficients (W/(m^2 K)) from published correlations, with air properties at the film
 * temperature (mean of surface and air). Each method names its correlation; the usual spread of such
 * correlations against measurements is 10 to 25 %.
 */
public final class Convection {
    /** Stefan-Boltzmann constant, W/(m^2 K^4). */
    public static final double STEFAN_BOLTZMANN = 5.670374419e-8;
    /** Standard gravity, m/s^2. */
    static final double GRAVITY_MS2 = 9.80665;
    /** Free-disc transition Reynolds number (Cobb &amp; Saunders 1956). */
    static final double DISC_TRANSITION_RE = 2.4e5;
    /** Flat-plate transition Reynolds number (Incropera &amp; DeWitt, section 7.2). */
    static final double PLATE_TRANSITION_RE = 5e5;

    private Convection() {
    }

    /**
     * Natural convection from a vertical plate, Churchill &amp; Chu (1975), valid for all Rayleigh numbers:
     * Nu_L = {0.825 + 0.387 Ra^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}^2 (Incropera &amp; DeWitt eq. 9.26).
     *
     * @param heightM   plate height L, m, &gt; 0
     * @param surfaceC  surface temperature, C
     * @param ambientC  air temperature, C
     * @return h, W/(m^2 K); 0 when the surface is not warmer than the air
     */
    public static double naturalVerticalPlateH(double heightM, double surfaceC, double ambientC) {
        new Checks().positive("heightM", heightM).throwIfAny();
        if (surfaceC <= ambientC) {
            return 0.0;
        }
        double film = Air.clampC((surfaceC + ambientC) / 2);
        double pr = Air.prandtl(film);
        double ra = rayleigh(heightM, surfaceC, ambientC);
        double nu = Math.pow(0.825 + 0.387 * Math.pow(ra, 1.0 / 6) / Math.pow(1 + Math.pow(0.492 / pr, 9.0 / 16),
                8.0 / 27), 2);
        return nu * Air.conductivityWPerMK(film) / heightM;
    }

    /**
     * Natural convection from a long horizontal cylinder, Churchill &amp; Chu (1975), Ra_D &lt;= 1e12:
     * Nu_D = {0.60 + 0.387 Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}^2 (Incropera &amp; DeWitt eq. 9.34).
     *
     * @param diameterM cylinder diameter D, m, &gt; 0
     * @return h, W/(m^2 K); 0 when the surface is not warmer than the air
     */
    public static double naturalHorizontalCylinderH(double diameterM, double surfaceC, double ambientC) {
        new Checks().positive("diameterM", diameterM).throwIfAny();
        if (surfaceC <= ambientC) {
            return 0.0;
        }
        double film = Air.clampC((surfaceC + ambientC) / 2);
        double pr = Air.prandtl(film);
        double ra = rayleigh(diameterM, surfaceC, ambientC);
        double nu = Math.pow(0.60 + 0.387 * Math.pow(ra, 1.0 / 6) / Math.pow(1 + Math.pow(0.559 / pr, 9.0 / 16),
                8.0 / 27), 2);
        return nu * Air.conductivityWPerMK(film) / diameterM;
    }

    /**
     * Rayleigh number g beta dT L^3 / (nu alpha) with beta = 1 / T_film (ideal gas) and alpha = nu / Pr.
     */
    static double rayleigh(double lengthM, double surfaceC, double ambientC) {
        double film = Air.clampC((surfaceC + ambientC) / 2);
        double nu = Air.kinematicViscosityM2s(film);
        double alpha = nu / Air.prandtl(film);
        return GRAVITY_MS2 / (film + 273.15) * (surfaceC - ambientC) * Math.pow(lengthM, 3) / (nu * alpha);
    }

    /**
     * Average heat transfer from one face of a disc rotating in still air, Cobb &amp; Saunders (1956):
     * Nu_R = 0.36 Re^0.5 below Re = 2.4e5 (laminar); above it the mixed laminar-turbulent face
     * Nu_R = 0.015 Re^0.8 - 100, with Re = omega R^2 / nu and Nu_R = h R / k (coefficients from memory).
     *
     * @param radiusM     disc radius R, m, &gt; 0
     * @param omegaRadS   angular speed, rad/s, &gt;= 0 (0 gives 0)
     * @param filmC       film temperature, C
     * @return h, W/(m^2 K), averaged over the face
     */
    public static double rotatingDiscH(double radiusM, double omegaRadS, double filmC) {
        new Checks().positive("radiusM", radiusM).nonNegative("omegaRadS", omegaRadS).throwIfAny();
        filmC = Air.clampC(filmC);
        double re = omegaRadS * radiusM * radiusM / Air.kinematicViscosityM2s(filmC);
        double laminar = 0.36 * Math.sqrt(re);
        double nu = re < DISC_TRANSITION_RE ? laminar : Math.max(laminar, 0.015 * Math.pow(re, 0.8) - 100.0);
        return nu * Air.conductivityWPerMK(filmC) / radiusM;
    }

    /**
     * Heat transfer across the annular air gap between a rotating inner cylinder and a stationary outer one,
     * Becker &amp; Kaye (1962) as quoted by Staton &amp; Cavagnino (IEEE Trans. Ind. Electron. 55(10), 2008) and
     * Howey, Childs &amp; Holmes (IEEE Trans. Ind. Electron. 59(3), 2012): with the Taylor number
     * Ta = omega^2 r_m g^3 / nu^2 (geometric factor taken as 1 for a thin gap),
     * Nu = 2 (Ta &lt; 1700, laminar: conduction), 0.128 Ta^0.367 (1700 to 1e4, Taylor vortices),
     * 0.409 Ta^0.241 (1e4 to 1e7, turbulent); Nu = h 2g / k.
     *
     * @param gapM          radial gap g, m, &gt; 0
     * @param meanRadiusM   mean gap radius r_m, m, &gt; 0
     * @param omegaRadS     rotor angular speed, rad/s, &gt;= 0
     * @param filmC         air temperature in the gap, C
     * @return h, W/(m^2 K), on each of the two gap surfaces
     */
    public static double airGapH(double gapM, double meanRadiusM, double omegaRadS, double filmC) {
        new Checks().positive("gapM", gapM).positive("meanRadiusM", meanRadiusM).nonNegative("omegaRadS", omegaRadS)
                .throwIfAny();
        filmC = Air.clampC(filmC);
        double nu = Air.kinematicViscosityM2s(filmC);
        double ta = omegaRadS * omegaRadS * meanRadiusM * Math.pow(gapM, 3) / (nu * nu);
        return taylorCouetteNusselt(ta) * Air.conductivityWPerMK(filmC) / (2 * gapM);
    }

    /** Becker &amp; Kaye (1962) Nusselt number for the modified Taylor number (see {@link #airGapH}). */
    static double taylorCouetteNusselt(double taylor) {
        if (taylor < 1700) {
            return 2.0;
        }
        if (taylor < 1e4) {
            return 0.128 * Math.pow(taylor, 0.367);
        }
        return 0.409 * Math.pow(taylor, 0.241);
    }

    /**
     * End-winding and end-space convection, h = 15 (1 + 0.4 v^0.9) with v the air speed in the end space
     * (taken as the rotor's peripheral speed), Schubert (1968) as listed by Staton &amp; Cavagnino (2008);
     * coefficients from memory. Spread between published end-space correlations is about +-30 %.
     *
     * @param airSpeedMs air speed, m/s, &gt;= 0
     */
    public static double endSpaceH(double airSpeedMs) {
        new Checks().nonNegative("airSpeedMs", airSpeedMs).throwIfAny();
        return 15.0 * (1.0 + 0.4 * Math.pow(airSpeedMs, 0.9));
    }

    /**
     * Forced convection along a flat surface in a parallel stream, average over the length:
     * Nu_L = 0.664 Re^0.5 Pr^(1/3) laminar (Re &lt; 5e5), (0.037 Re^0.8 - 871) Pr^(1/3) mixed
     * (Incropera &amp; DeWitt eqs. 7.30 and 7.38). Used for a housing lying along the wind.
     *
     * @param lengthM    length along the flow, m, &gt; 0
     * @param airSpeedMs air speed, m/s, &gt;= 0 (0 gives 0)
     * @param filmC      film temperature, C
     */
    public static double flatPlateForcedH(double lengthM, double airSpeedMs, double filmC) {
        new Checks().positive("lengthM", lengthM).nonNegative("airSpeedMs", airSpeedMs).throwIfAny();
        filmC = Air.clampC(filmC);
        double re = airSpeedMs * lengthM / Air.kinematicViscosityM2s(filmC);
        double pr3 = Math.cbrt(Air.prandtl(filmC));
        double nu = re < PLATE_TRANSITION_RE ? 0.664 * Math.sqrt(re) * pr3 : (0.037 * Math.pow(re, 0.8) - 871) * pr3;
        return nu * Air.conductivityWPerMK(filmC) / lengthM;
    }

    /**
     * A cylinder rotating about its own axis in still air, Nu_D = 0.133 Re_D^(2/3) Pr^(1/3) with
     * Re_D = omega D^2 / nu (Re_D &lt; 4.3e5; Becker (1963) as quoted in heat-transfer texts; from memory).
     * Used for the shell of an outer rotor.
     */
    public static double rotatingCylinderH(double diameterM, double omegaRadS, double filmC) {
        new Checks().positive("diameterM", diameterM).nonNegative("omegaRadS", omegaRadS).throwIfAny();
        filmC = Air.clampC(filmC);
        double re = omegaRadS * diameterM * diameterM / Air.kinematicViscosityM2s(filmC);
        return 0.133 * Math.pow(re, 2.0 / 3) * Math.cbrt(Air.prandtl(filmC)) * Air.conductivityWPerMK(filmC) / diameterM;
    }

    /**
     * Mixed forced and natural convection, h = (h_forced^3 + h_natural^3)^(1/3) (Churchill's blending with
     * exponent 3 for assisting or transverse flows; Incropera &amp; DeWitt eq. 9.64).
     */
    public static double combined(double forcedH, double naturalH) {
        return Math.cbrt(Math.pow(forcedH, 3) + Math.pow(naturalH, 3));
    }

    /**
     * Linearised radiation to surroundings at the air temperature, h_r = eps sigma (Ts + Ta)(Ts^2 + Ta^2)
     * (Incropera &amp; DeWitt eq. 1.9).
     *
     * @param emissivity surface emissivity, 0 to 1 (about 0.9 for paint or resin; common practice)
     */
    public static double radiationH(double emissivity, double surfaceC, double ambientC) {
        new Checks().range("emissivity", emissivity, 0.0, 1.0).throwIfAny();
        double ts = surfaceC + 273.15;
        double ta = ambientC + 273.15;
        return emissivity * STEFAN_BOLTZMANN * (ts + ta) * (ts * ts + ta * ta);
    }
}
