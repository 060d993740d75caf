package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * Bare and enamelled diameters of round copper magnet wire.
 *
 * <p>AWG diameters follow the defining formula of ASTM B258: d = 0.127 mm * 92^((36 - n)/39).
 * The enamel build (overall diameter over the insulation) follows the maximum overall diameters of
 * IEC 60317-0-1 for grade 1 and grade 2 enamelled round copper wire.
 */
public final class WireSize {
    /** Smallest supported AWG number (largest wire). */
    public static final int MIN_AWG = 4;
    /** Largest supported AWG number (finest wire). */
    public static final int MAX_AWG = 40;
    /** Smallest metric nominal bare diameter accepted, m. */
    public static final double MIN_METRIC_DIAMETER_M = 0.10 / 1000.0;
    /** Largest metric nominal bare diameter accepted, m. */
    public static final double MAX_METRIC_DIAMETER_M = 3.00 / 1000.0;

    private static final double AWG36_DIAMETER_M = 0.127e-3;

    /*
     * Maximum overall diameter of enamelled round copper wire, mm: nominal bare diameter, grade 1, grade 2.
     * source: IEC 60317-0-1 maximum overall diameters, as tabulated in the OpenMagnetics MAS wire database
     * (repository OpenMagnetics/MAS, data/wires.ndjson, IEC 60317 entries); 1.000 mm -> 1.062 / 1.094 mm
     * agrees with the IEC table as remembered (from memory).
     */
    private static final double[][] ENAMEL_TABLE_MM = {
            {0.100, 0.117, 0.125},
            {0.125, 0.144, 0.154},
            {0.150, 0.171, 0.182},
            {0.200, 0.226, 0.239},
            {0.250, 0.281, 0.297},
            {0.300, 0.334, 0.352},
            {0.355, 0.392, 0.411},
            {0.400, 0.439, 0.459},
            {0.450, 0.491, 0.513},
            {0.500, 0.544, 0.566},
            {0.560, 0.606, 0.630},
            {0.630, 0.679, 0.704},
            {0.710, 0.762, 0.789},
            {0.800, 0.855, 0.884},
            {0.900, 0.959, 0.989},
            {1.000, 1.062, 1.094},
            {1.120, 1.184, 1.217},
            {1.250, 1.316, 1.349},
            {1.400, 1.468, 1.502},
            {1.600, 1.670, 1.706},
            {1.800, 1.872, 1.909},
            {2.000, 2.074, 2.112},
            {2.240, 2.316, 2.355},
            {2.500, 2.578, 2.618},
            {2.800, 2.880, 2.922},
            {3.150, 3.233, 3.276},
            {3.550, 3.635, 3.679},
            {4.000, 4.088, 4.133},
            {4.500, 4.591, 4.637},
            {5.000, 5.093, 5.141},
    };

    private WireSize() {
    }

    /**
     * Bare diameter of a solid round AWG conductor by the ASTM B258 defining formula, unrounded.
     *
     * @param awg gauge number, {@value #MIN_AWG} to {@value #MAX_AWG}
     * @return diameter, m
     * @throws coilwright.validation.InvalidInputException if awg is out of range
     */
    public static double awgDiameterM(int awg) {
        new Checks().intRange("awg", awg, MIN_AWG, MAX_AWG).throwIfAny();
        return AWG36_DIAMETER_M * Math.pow(92.0, (36.0 - awg) / 39.0);
    }

    /**
     * The (fractional) AWG number whose ASTM B258 diameter equals {@code diameterM}: the inverse of the
     * defining formula, n = 36 - 39 * ln(d / 0.127 mm) / ln(92). Useful for labelling a measured wire.
     *
     * @param diameterM bare diameter, m, 0.01 mm to 10 mm
     * @return gauge number, not rounded
     */
    public static double equivalentAwg(double diameterM) {
        new Checks().range("diameterM", diameterM, 0.01e-3, 10e-3).throwIfAny();
        return 36.0 - 39.0 * Math.log(diameterM / AWG36_DIAMETER_M) / Math.log(92.0);
    }

    /**
     * Maximum overall diameter over the enamel for a bare diameter, by linear interpolation of the
     * diameter increase between the IEC 60317-0-1 table points (grade 1 or grade 2). Outside the table
     * (below 0.100 mm or above 5.000 mm) the increase of the nearest end point is used.
     *
     * @param bareDiameterM bare conductor diameter, m, &gt; 0
     * @param insulationGrade 1 or 2
     * @return overall diameter, m
     */
    public static double overallDiameterM(double bareDiameterM, int insulationGrade) {
        new Checks().range("bareDiameterM", bareDiameterM, 0.01e-3, 10e-3)
                .intRange("insulationGrade", insulationGrade, 1, 2).throwIfAny();
        double dMm = bareDiameterM * 1000.0;
        int col = insulationGrade;
        double[][] t = ENAMEL_TABLE_MM;
        double increaseMm;
        if (dMm <= t[0][0]) {
            increaseMm = t[0][col] - t[0][0];
        } else if (dMm >= t[t.length - 1][0]) {
            increaseMm = t[t.length - 1][col] - t[t.length - 1][0];
        } else {
            int i = 1;
            while (t[i][0] < dMm) {
                i++;
            }
            double f = (dMm - t[i - 1][0]) / (t[i][0] - t[i - 1][0]);
            double lo = t[i - 1][col] - t[i - 1][0];
            double hi = t[i][col] - t[i][0];
            increaseMm = lo + f * (hi - lo);
        }
        return (dMm + increaseMm) / 1000.0;
    }
}
