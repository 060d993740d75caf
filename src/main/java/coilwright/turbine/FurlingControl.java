package coilwright.turbine;

/**
 * Over-speed control of a small wind turbine as the wind speed the rotor effectively sees. A furling rotor turns out
 * of the wind by an angle gamma; the wind component through it is v cos(gamma) and, at the same tip-speed ratio, its
 * power follows (v cos gamma)^3 (the cosine-cubed model of a yawed rotor, e.g. Burton et al., "Wind Energy
 * Handbook", 2nd ed., 2011, section 3.10; real rotors lose a little less than that, from memory). The matched
 * operating point above furling is found with the rotor in this effective wind, so rotor power, speed and torque all
 * follow the control. An rpm limit set on {@link WindRotor#maxRotorSpeedRpm()} is separate from this.
 */
public sealed interface FurlingControl permits NoFurling, TailFurling, PowerLimitCurve {

    /**
     * The wind speed the rotor effectively sees, m/s (&lt;= the wind speed).
     *
     * @param windSpeedMs     free wind speed, m/s, 0 to 100
     * @param rotor           the rotor (its ideal power, for a power-limit curve)
     * @param airDensityKgM3  air density, kg/m^3
     */
    double effectiveWindSpeedMs(double windSpeedMs, WindRotor rotor, double airDensityKgM3);
}
