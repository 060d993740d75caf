package coilwright.load;

import coilwright.validation.Checks;

/**
 * A copper cable run: one-way length, conductor cross-section and conductor temperature.
 *
 * @param lengthM          one-way length, 0 to 10 000 m (0 means no cable)
 * @param conductorAreaM2  cross-section of one conductor, 1e-8 to 1e-2 m^2
 * @param temperatureC     conductor temperature, -50 to 250 C
 */
public record Cable(double lengthM, double conductorAreaM2, double temperatureC) {
    /** No cable at all (zero length). */
    public static final Cable NONE = new Cable(0, 1e-6, 20);

    public Cable {
        new Checks()
                .range("lengthM", lengthM, 0, 10_000)
                .range("conductorAreaM2", conductorAreaM2, 1e-8, 1e-2)
                .range("temperatureC", temperatureC, -50, 250)
                .throwIfAny();
    }

    /** Resistance of one conductor (one AC line), Ohm: rho(T) * L / A. */
    public double lineResistanceOhm() {
        return lengthM == 0 ? 0 : coilwright.conductor.Copper.resistanceOhm(lengthM, conductorAreaM2, temperatureC);
    }

    /** Loop resistance of a go-and-return pair (DC cable, single-phase AC), Ohm: 2 * rho(T) * L / A. */
    public double pairResistanceOhm() {
        return 2 * lineResistanceOhm();
    }
}
