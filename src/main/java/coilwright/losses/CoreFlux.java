package coilwright.losses;

import coilwright.machine.SlottedStator;
import coilwright.magnet.GapField;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Peak flux densities and masses of the teeth and yoke of a slotted stator with parallel-sided slots, from the gap
 * field (the usual magnetic-circuit estimate, e.g. Hanselman, "Brushless Permanent Magnet Motor Design", 2nd ed.,
 * 2006, ch. 4): a tooth under the pole centre carries the gap flux of one slot pitch,
 * B_t = B_g,peak tau_s / (k_st w_t); the yoke carries half the flux of a pole, B_y = Phi_1 / (2 k_st h_y L), with
 * the fundamental flux per pole (the fundamental carries nearly all the yoke flux). Leakage between tooth tips is
 * neglected, which errs high.
 *
 * @param toothMeanT       peak flux density at the tooth's mean width, T (used for loss)
 * @param toothMaxT        peak flux density at the tooth's narrowest width, T (saturation check)
 * @param yokeT            peak flux density in the yoke, T
 * @param toothMassKg      iron mass of all teeth (tips included), kg
 * @param yokeMassKg       iron mass of the yoke, kg
 * @param toothMeanWidthM  tooth width at mid-slot radius, m
 * @param warnings         saturation cautions
 */
public record CoreFlux(double toothMeanT, double toothMaxT, double yokeT, double toothMassKg, double yokeMassKg,
                       double toothMeanWidthM, List<String> warnings) {
    /** Tooth flux density above which ordinary non-oriented steel saturates noticeably, T (common practice). */
    public static final double TOOTH_SATURATION_T = 1.8;
    /** Yoke flux density above which ordinary non-oriented steel saturates noticeably, T (common practice). */
    public static final double YOKE_SATURATION_T = 1.6;

    public CoreFlux {
        warnings = List.copyOf(warnings);
    }

    /**
     * Teeth and yoke of a radial machine.
     *
     * @param field the gap field at the working magnet temperature (its 2-D peak and fundamental flux per pole)
     * @throws InfeasibleDesignException when the teeth have no width or the yoke reaches the axis
     */
    public static CoreFlux of(RadialSurfaceRotor rotor, SlottedStator stator, StatorCore core, int slots,
                              GapField field) {
        new Checks().intRange("slots", slots, 2, 400).present("field", field).throwIfAny();
        boolean inner = rotor.side() == RotorSide.INNER;
        double rb = rotor.gapDiameterM() / 2;
        double toothLength = stator.toothTipHeightM() + stator.slotDepthM();
        double sign = inner ? 1 : -1;
        double rNarrow = inner ? rb + stator.toothTipHeightM() : rb - toothLength;
        double rMid = rb + sign * (stator.toothTipHeightM() + stator.slotDepthM() / 2);
        double rYoke = rb + sign * (toothLength + core.yokeThicknessM() / 2);
        double wMin = 2 * Math.PI * rNarrow / slots - stator.slotWidthM();
        double wMean = 2 * Math.PI * rMid / slots - stator.slotWidthM();
        if (wMin <= 0 || rYoke - core.yokeThicknessM() / 2 <= 0) {
            throw new InfeasibleDesignException("stator.slotWidthM", String.format(Locale.ROOT,
                    "stator.slotWidthM = %s: %d slots leave no tooth (narrowest tooth %.5f m) or the yoke reaches "
                            + "the axis", Checks.fmt(stator.slotWidthM()), slots, wMin));
        }
        double k = core.stackingFactor();
        double length = rotor.stackLengthM();
        double slotPitch = 2 * Math.PI * rb / slots;
        double bg = field.peakFluxDensity2dT();
        double toothMean = bg * slotPitch / (k * wMean);
        double toothMax = bg * slotPitch / (k * wMin);
        double yoke = field.fluxPerPoleWb() / (2 * k * core.yokeThicknessM() * length);
        double density = core.steel().densityKgM3();
        double toothMass = slots * wMean * toothLength * length * k * density;
        double yokeMass = 2 * Math.PI * rYoke * core.yokeThicknessM() * length * k * density;
        List<String> w = new ArrayList<>();
        if (toothMax > TOOTH_SATURATION_T) {
            w.add(String.format(Locale.ROOT, "teeth reach %.2f T at their narrowest: above about %.1f T the steel "
                    + "saturates, the EMF falls below the estimate and iron loss rises", toothMax, TOOTH_SATURATION_T));
        }
        if (yoke > YOKE_SATURATION_T) {
            w.add(String.format(Locale.ROOT, "the yoke carries %.2f T: above about %.1f T it saturates; a deeper "
                    + "back iron is needed", yoke, YOKE_SATURATION_T));
        }
        return new CoreFlux(toothMean, toothMax, yoke, toothMass, yokeMass, wMean, w);
    }
}
