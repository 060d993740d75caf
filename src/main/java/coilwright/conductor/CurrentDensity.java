package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * RMS current density in a conductor checked against the band of its cooling.
 *
 * @param densityAPerM2   J, A/m^2
 * @param densityAPerMm2  J, A/mm^2
 * @param cooling         the cooling the band belongs to
 * @param bandLowAPerMm2  lower end of the usual band, A/mm^2
 * @param bandHighAPerMm2 upper end of the usual band, A/mm^2
 * @param status          OK up to the band's upper end, ABOVE_BAND beyond it
 */
public record CurrentDensity(double densityAPerM2, double densityAPerMm2, Cooling cooling, double bandLowAPerMm2,
                             double bandHighAPerMm2, Status status) {
    /** Verdict of a current-density check. */
    public enum Status { OK, ABOVE_BAND }

    /**
     * J = I / A for one conductor. With parallel paths pass the current of one path (phase current / paths).
     *
     * @param currentRmsA     rms current in the conductor, A, &gt;= 0
     * @param conductorAreaM2 copper area of the conductor (all strands in hand), m^2, &gt; 0
     * @param cooling         how the winding is cooled
     */
    public static CurrentDensity check(double currentRmsA, double conductorAreaM2, Cooling cooling) {
        new Checks().nonNegative("currentRmsA", currentRmsA).positive("conductorAreaM2", conductorAreaM2)
                .present("cooling", cooling).throwIfAny();
        double j = currentRmsA / conductorAreaM2;
        double jMm2 = j * 1e-6;
        Status status = jMm2 > cooling.highAPerMm2() ? Status.ABOVE_BAND : Status.OK;
        return new CurrentDensity(j, jMm2, cooling, cooling.lowAPerMm2(), cooling.highAPerMm2(), status);
    }
}
