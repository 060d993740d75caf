/**
 * The turbine side of a small wind or micro-hydro plant: wind rotors with their power-coefficient curves,
 * site air density and wind-speed distributions, the IEC 61400-12-1 bin method for annual energy,
 * penstock friction and net head, and impulse/crossflow runners with their torque-speed lines.
 * Everything is in SI units; torque and power are exposed as functions of speed so that the
 * {@code system} package can match them to an alternator.
 */
package coilwright.turbine;
