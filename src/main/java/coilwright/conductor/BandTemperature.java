package coilwright.conductor;

import coilwright.validation.Checks;

import java.util.OptionalDouble;

/**
 * A winding temperature estimated from its current density alone, for machines whose geometry is not known (a
 * rewind planned from measurements). The copper loss per copper volume is rho(T) J^2; with the coil, the stator and
 * the cooling unchanged, the rise above ambient is proportional to it: dT = K rho(T) J^2 (Newton's law of cooling
 * with a fixed conductance). K is calibrated on the cooling's usual band ({@link Cooling}): a winding at the top of
 * the band is taken to run at the class B rise of IEC 60034-1 (80 K by resistance over a 40 C coolant, mean winding
 * temperature 120 C). That calibration is this project's reading of the bands (from memory, see {@link Cooling}):
 * the figure is an estimate good to perhaps +-30 % of the rise, to be replaced by a full design's thermal model.
 *
 * <p>With rho(T) = rho20 (1 + alpha (T - 20)) (IEC 60028) the fixed point is linear:
 * T = (Ta + c (1 - 20 alpha)) / (1 - c alpha), c = dT_ref (J / J_top)^2 / (1 + alpha (T_ref - 20)); when c alpha
 * reaches 1 the copper's rising resistance outruns the cooling and there is no steady temperature.
 */
public final class BandTemperature {
    /** Class B (130) temperature rise by resistance of an indirectly air-cooled winding, K (IEC 60034-1; the value
     *  from memory of its table). */
    public static final double REFERENCE_RISE_K = 80.0;
    /** Coolant temperature of that rise, C (IEC 60034-1). */
    public static final double REFERENCE_COOLANT_C = 40.0;

    private BandTemperature() {
    }

    /**
     * The steady mean winding temperature.
     *
     * @param currentDensityAPerMm2 rms current density in the copper, A/mm^2, 0 to 100
     * @param cooling               the cooling, whose band top calibrates the rise
     * @param ambientC              ambient temperature, C, -40 to 60
     * @return the temperature, C; empty when no steady temperature exists (thermal runaway) or it is above
     *         {@link Copper#MAX_TEMPERATURE_C}
     */
    public static OptionalDouble windingC(double currentDensityAPerMm2, Cooling cooling, double ambientC) {
        new Checks().range("currentDensityAPerMm2", currentDensityAPerMm2, 0, 100).present("cooling", cooling)
                .range("ambientC", ambientC, -40, 60).throwIfAny();
        double alpha = Copper.ALPHA_20C_PER_K;
        double ratio = currentDensityAPerMm2 / cooling.highAPerMm2();
        double c = REFERENCE_RISE_K * ratio * ratio / Copper.resistanceRatio(REFERENCE_COOLANT_C + REFERENCE_RISE_K);
        if (c * alpha >= 1) {
            return OptionalDouble.empty();
        }
        double t = (ambientC + c * (1 - 20 * alpha)) / (1 - c * alpha);
        return t <= Copper.MAX_TEMPERATURE_C ? OptionalDouble.of(t) : OptionalDouble.empty();
    }
}
