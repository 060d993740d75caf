package coilwright.magnet;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.Locale;

/**
 * Carter's coefficient for a slotted iron surface facing smooth iron (Carter, 1901, conformal mapping of a
 * slot of infinite depth): k_c = tau_s / (tau_s - gamma * g) with
 * gamma = (4/pi) * [ (b_o/2g) * atan(b_o/2g) - ln sqrt(1 + (b_o/2g)^2) ].
 * The same result written with b_o instead of g is the form in Pyrhönen, Jokinen &amp; Hrabovcová,
 * "Design of Rotating Electrical Machines" (Wiley, 2008): k_c = tau_s / (tau_s - kappa * b_o),
 * kappa = (2/pi) * [ atan(b_o/2g) - (2g/b_o) * ln sqrt(1 + (b_o/2g)^2) ].
 */
public final class CarterCoefficient {

    private CarterCoefficient() {
    }

    /**
     * Carter's gamma, the equivalent slot-opening width in units of the gap: the flux lost to one slot opening
     * equals that of a strip gamma * g wide.
     *
     * @param slotOpeningM slot opening b_o in metres, >= 0
     * @param airGapM      gap g in metres, > 0
     */
    public static double gamma(double slotOpeningM, double airGapM) {
        new Checks().nonNegative("slotOpeningM", slotOpeningM).positive("airGapM", airGapM).throwIfAny();
        double u = slotOpeningM / (2.0 * airGapM);
        return 4.0 / Math.PI * (u * Math.atan(u) - 0.5 * Math.log1p(u * u));
    }

    /**
     * Carter's coefficient k_c >= 1 (Carter 1901).
     *
     * @param slotPitchM   slot pitch at the gap surface tau_s in metres, > 0
     * @param slotOpeningM slot opening b_o in metres, 0 <= b_o < tau_s (0 gives exactly 1)
     * @param airGapM      gap g in metres, > 0
     * @return k_c, dimensionless, >= 1
     * @throws InfeasibleDesignException on {@code slotOpeningM} when the opening is not narrower than the slot pitch
     */
    public static double of(double slotPitchM, double slotOpeningM, double airGapM) {
        new Checks().positive("slotPitchM", slotPitchM).nonNegative("slotOpeningM", slotOpeningM)
                .positive("airGapM", airGapM).throwIfAny();
        if (slotOpeningM >= slotPitchM) {
            throw new InfeasibleDesignException("slotOpeningM", String.format(Locale.ROOT,
                    "slotOpeningM = %s: the slot opening must be narrower than the slot pitch %.5f m (no tooth left)",
                    Checks.fmt(slotOpeningM), slotPitchM));
        }
        return slotPitchM / (slotPitchM - gamma(slotOpeningM, airGapM) * airGapM);
    }
}
