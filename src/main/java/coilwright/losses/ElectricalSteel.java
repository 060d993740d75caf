package coilwright.losses;

import coilwright.validation.Checks;

/**
 * A non-oriented electrical steel with its loss separated by the Bertotti (1988) statistical loss theory:
 * <pre>  p = k_h f B^a  +  k_c (f B)^2  +  k_e (f B)^1.5      W/kg, B peak (T), f (Hz), sinusoidal flux</pre>
 * hysteresis (a Steinmetz term), classical eddy current and excess (anomalous) loss.
 * The classical coefficient is not fitted but computed from the sheet: k_c = pi^2 d^2 / (6 rho_e delta)
 * (thickness d, resistivity rho_e, density delta). The excess coefficient is set so that excess equals classical
 * loss at 1.5 T, 50 Hz (an eddy-current anomaly factor of 2, typical of non-oriented steels at power frequency;
 * from memory). k_h and a are then fixed by the two loss figures the standard guarantees for the grade, at 1.0 T and
 * 1.5 T, 50 Hz. Built with {@link #fromGuaranteedLosses}.
 *
 * @param name                      grade name, e.g. {@code "M400-50A"}
 * @param thicknessM                sheet thickness, m
 * @param densityKgM3               conventional density, kg/m^3
 * @param resistivityOhmM           electrical resistivity, Ohm m
 * @param loss15WPerKg              guaranteed maximum specific loss at 1.5 T, 50 Hz, W/kg
 * @param loss10WPerKg              guaranteed maximum specific loss at 1.0 T, 50 Hz, W/kg
 * @param hysteresisCoefficient     k_h, W/(kg Hz T^a)
 * @param hysteresisExponent        a (Steinmetz exponent of the hysteresis term)
 * @param classicalCoefficient      k_c, W/(kg Hz^2 T^2)
 * @param excessCoefficient         k_e, W/(kg (Hz T)^1.5)
 * @param source                    where the guaranteed figures and sheet properties come from
 */
public record ElectricalSteel(String name, double thicknessM, double densityKgM3, double resistivityOhmM,
                              double loss15WPerKg, double loss10WPerKg, double hysteresisCoefficient,
                              double hysteresisExponent, double classicalCoefficient, double excessCoefficient,
                              String source) {
    /** Eddy-current anomaly factor (classical + excess) / classical at 1.5 T, 50 Hz (from memory). */
    public static final double ANOMALY_FACTOR_AT_50HZ = 2.0;
    /** Highest flux density the loss model is used at, T (beyond it the steel saturates). */
    public static final double MAX_FLUX_DENSITY_T = 2.2;

    public ElectricalSteel {
        Checks c = new Checks();
        c.require(name != null && !name.isBlank(), "name", name, "must be a grade name", "a name");
        c.range("thicknessM", thicknessM, 0.0001, 0.002);
        c.range("densityKgM3", densityKgM3, 7000, 8000);
        c.range("resistivityOhmM", resistivityOhmM, 0.1e-6, 1.0e-6);
        c.positive("loss15WPerKg", loss15WPerKg);
        c.positive("loss10WPerKg", loss10WPerKg);
        c.positive("hysteresisCoefficient", hysteresisCoefficient);
        c.range("hysteresisExponent", hysteresisExponent, 1.2, 3.5);
        c.positive("classicalCoefficient", classicalCoefficient);
        c.nonNegative("excessCoefficient", excessCoefficient);
        c.require(source != null && !source.isBlank(), "source", source, "must name a source", "text");
        c.throwIfAny();
    }

    /**
     * Fits the separation to the two guaranteed losses (see the class description).
     *
     * @throws IllegalArgumentException when the figures leave no positive hysteresis loss
     */
    public static ElectricalSteel fromGuaranteedLosses(String name, double thicknessM, double densityKgM3,
                                                       double resistivityOhmM, double loss15WPerKg,
                                                       double loss10WPerKg, String source) {
        double kc = Math.PI * Math.PI * thicknessM * thicknessM / (6 * resistivityOhmM * densityKgM3);
        double fb15 = 50 * 1.5;
        double fb10 = 50 * 1.0;
        double ke = (ANOMALY_FACTOR_AT_50HZ - 1) * kc * fb15 * fb15 / Math.pow(fb15, 1.5);
        double h15 = loss15WPerKg - kc * fb15 * fb15 - ke * Math.pow(fb15, 1.5);
        double h10 = loss10WPerKg - kc * fb10 * fb10 - ke * Math.pow(fb10, 1.5);
        if (h15 <= 0 || h10 <= 0) {
            throw new IllegalArgumentException(name + ": eddy-current losses alone exceed the guaranteed loss");
        }
        double a = Math.log(h15 / h10) / Math.log(1.5);
        double kh = h10 / 50.0;
        return new ElectricalSteel(name, thicknessM, densityKgM3, resistivityOhmM, loss15WPerKg, loss10WPerKg, kh, a,
                kc, ke, source);
    }

    /**
     * Specific loss with sinusoidal flux, split into its three parts.
     *
     * @param peakFluxDensityT peak flux density, 0 to 2.2 T
     * @param frequencyHz      frequency, 0 to 5000 Hz
     */
    public SpecificLoss specificLoss(double peakFluxDensityT, double frequencyHz) {
        new Checks().range("peakFluxDensityT", peakFluxDensityT, 0, MAX_FLUX_DENSITY_T)
                .range("frequencyHz", frequencyHz, 0, 5000).throwIfAny();
        double fb = frequencyHz * peakFluxDensityT;
        return new SpecificLoss(hysteresisCoefficient * frequencyHz * Math.pow(peakFluxDensityT, hysteresisExponent),
                classicalCoefficient * fb * fb, excessCoefficient * Math.pow(fb, 1.5));
    }

    /**
     * Specific loss split into hysteresis, classical eddy-current and excess parts, W/kg.
     */
    public record SpecificLoss(double hysteresisWPerKg, double eddyWPerKg, double excessWPerKg) {
        /** Sum of the three parts, W/kg. */
        public double totalWPerKg() {
            return hysteresisWPerKg + eddyWPerKg + excessWPerKg;
        }
    }
}
