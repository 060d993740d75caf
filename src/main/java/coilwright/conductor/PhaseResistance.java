package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * DC resistance and copper of one phase:
 * R = rho(T) * (turnsPerCoil * coilsPerPhase * MLT) / (strands * strandArea) / parallelPaths^2,
 * with copper after IEC 60028 ({@link Copper}). End connections and leads are not included.
 *
 * @param resistance20COhm      phase resistance at 20 C, Ohm
 * @param resistanceHotOhm      phase resistance at the working temperature, Ohm
 * @param workingTemperatureC   the working temperature, C
 * @param conductorLengthM      conductor length in the phase (each strand), m
 * @param copperMassPerPhaseKg  copper mass of the phase (all strands), kg
 */
public record PhaseResistance(double resistance20COhm, double resistanceHotOhm, double workingTemperatureC,
                              double conductorLengthM, double copperMassPerPhaseKg) {

    /**
     * Computes the phase resistance.
     *
     * @param winding             the phase's coils and wire
     * @param workingTemperatureC copper temperature at the operating point, -50 to 250 C
     */
    public static PhaseResistance of(PhaseWinding winding, double workingTemperatureC) {
        new Checks().present("winding", winding).range("workingTemperatureC", workingTemperatureC,
                Copper.MIN_TEMPERATURE_C, Copper.MAX_TEMPERATURE_C).throwIfAny();
        double length = winding.conductorLengthM();
        double area = winding.wire().conductorCopperAreaM2();
        double paths = winding.parallelPaths();
        double r20 = Copper.RESISTIVITY_20C_OHM_M * length / area / (paths * paths);
        double hot = r20 * Copper.resistanceRatio(workingTemperatureC);
        double mass = Copper.massKg(length * area);
        return new PhaseResistance(r20, hot, workingTemperatureC, length, mass);
    }

    /** The phase resistance at another copper temperature (-50 to 250 C), Ohm. */
    public double resistanceOhmAt(double temperatureC) {
        return resistance20COhm * Copper.resistanceRatio(temperatureC);
    }

    /** Copper mass of all phases, kg. */
    public double copperMassTotalKg(int phases) {
        new Checks().intRange("phases", phases, 1, 12).throwIfAny();
        return copperMassPerPhaseKg * phases;
    }
}
