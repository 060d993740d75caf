package coilwright.magnet;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.IntToDoubleFunction;

/**
 * Air-gap flux density and fundamental flux per pole of a {@link RotorSpec}: the 1-D magnetic circuit and the
 * 2-D harmonic solution of {@link HarmonicGapField}. The 2-D flux per pole is the one to use for EMF.
 */
public final class GapFieldCalculator {

    /** Highest odd order reported in {@link GapField#harmonicAmplitudes()}. */
    public static final int REPORTED_MAX_ORDER = 13;
    /** Lowest highest-order summed for the pole-centre peak (more are summed when the gap is small, see below). */
    public static final int PEAK_MAX_ORDER = 199;
    /** The peak sum runs until k * d reaches this, d being the distance from the evaluation layer to the magnets:
     *  the terms then carry a factor below exp(-30). */
    private static final double PEAK_DECAY_EXPONENT = 30.0;

    private static final int GAUSS_POINTS = 5;
    private static final double INTEGRATION_RELATIVE_ACCURACY = 1e-10;
    private static final double INTEGRATION_ABSOLUTE_ACCURACY = 1e-16;
    private static final int INTEGRATION_MAX_EVALUATIONS = 100_000;

    private GapFieldCalculator() {
    }

    /**
     * Solves the gap field of a rotor facing its stator.
     *
     * @param rotor       the rotor (radial surface magnet or axial dual rotor)
     * @param poles       number of poles 2p, even, 2 to 1000
     * @param slots       radial: stator slots Q for the slot pitch pi*D/Q, 1 to 2000; axial (air-cored): ignored,
     *                    0 to 2000
     * @param magnetTempC magnet temperature in C, -60 to 300
     * @return the field, flux per pole, magnet mass and cautions
     * @throws coilwright.validation.InvalidInputException for an out-of-range argument
     * @throws InfeasibleDesignException when magnets overlap or a slot opening is wider than the slot pitch
     */
    public static GapField solve(RotorSpec rotor, int poles, int slots, double magnetTempC) {
        Checks c = new Checks();
        c.present("rotor", rotor);
        c.intRange("poles", poles, 2, 1000);
        c.require(poles % 2 == 0, "poles", poles, "must be even (north and south poles alternate)", "even, 2 to 1000");
        c.intRange("slots", slots, rotor instanceof AxialDualRotor ? 0 : 1, 2000);
        c.range("magnetTempC", magnetTempC, -60.0, 300.0);
        c.throwIfAny();
        if (rotor instanceof RadialSurfaceRotor r) {
            return radial(r, poles, slots, magnetTempC);
        }
        return axial((AxialDualRotor) rotor, poles, magnetTempC);
    }

    /**
     * Radial surface-magnet rotor, field on the stator surface with the Carter-scaled gap (curvature ignored:
     * the pole pitch is taken at the gap diameter). 1-D: Bg = Br l_m / (l_m + mu_r k_c g).
     */
    private static GapField radial(RadialSurfaceRotor r, int poles, int slots, double magnetTempC) {
        MagnetGrade grade = r.grade();
        double brT = grade.remanenceAt(magnetTempC);
        double mu = grade.recoilPermeability();
        double tauM = Math.PI * r.gapDiameterM() / poles;
        double slotPitchM = Math.PI * r.gapDiameterM() / slots;
        if (r.slotOpeningM() >= slotPitchM) {
            throw new InfeasibleDesignException("slotOpeningM", String.format(Locale.ROOT,
                    "slotOpeningM = %s: must be narrower than the slot pitch %.5f m (pi * gapDiameterM / %d slots)",
                    Checks.fmt(r.slotOpeningM()), slotPitchM, slots));
        }
        double kc = CarterCoefficient.of(slotPitchM, r.slotOpeningM(), r.airGapM());
        double gEffM = kc * r.airGapM();
        double lm = r.magnetThicknessM();
        double alpha = r.poleArcRatio();
        double bg1dT = brT * lm / (lm + mu * gEffM);
        IntToDoubleFunction bv = v -> HarmonicGapField.normalFluxDensityT(v, brT, mu, alpha, tauM, lm, gEffM, 0.0);
        double b1T = bv.applyAsDouble(1);
        double b11dT = HarmonicGapField.squareWaveFundamentalT(bg1dT, alpha);
        double lengthM = r.stackLengthM();
        double volumeM3 = r.magnetVolumeM3();
        return new GapField(brT, tauM, alpha, kc, gEffM, bg1dT, b11dT, b1T, reported(bv), peak(bv, tauM, gEffM),
                2.0 / Math.PI * b11dT * tauM * lengthM, 2.0 / Math.PI * b1T * tauM * lengthM, b1T / b11dT,
                volumeM3, volumeM3 * grade.material().densityKgPerM3(),
                "normal flux density on the stator iron surface (Carter-scaled gap, curvature ignored)",
                grade.temperatureWarnings(magnetTempC));
    }

    /**
     * Axial dual rotor with an air-cored stator: field averaged over the coil layer thickness; the flux per pole is
     * integrated over radius with the local pole pitch 2 pi r / 2p and local pole-arc ratio w / tau(r) (capped
     * at 1) of the rectangular magnets. 1-D: Bg = Br 2 l_m / (2 l_m + mu_r G).
     */
    private static GapField axial(AxialDualRotor a, int poles, double magnetTempC) {
        a.checkFits(poles);
        MagnetGrade grade = a.grade();
        double brT = grade.remanenceAt(magnetTempC);
        double mu = grade.recoilPermeability();
        double lm = a.magnetThicknessM();
        double gapM = a.magneticGapM();
        double halfGapM = gapM / 2.0;
        double halfLayerM = a.coilLayerThicknessM() / 2.0;
        double bg1dT = brT * 2.0 * lm / (2.0 * lm + mu * gapM);
        double tauCM = AxialDualRotor.polePitchAtM(a.magnetCentreRadiusM(), poles);
        double alphaC = a.magnetWidthM() / tauCM;
        IntToDoubleFunction bv = v ->
                HarmonicGapField.normalFluxDensityT(v, brT, mu, alphaC, tauCM, lm, halfGapM, halfLayerM);
        double b1T = bv.applyAsDouble(1);
        double b11dT = HarmonicGapField.squareWaveFundamentalT(bg1dT, alphaC);
        UnivariateFunction flux2d = rM -> {
            double tau = AxialDualRotor.polePitchAtM(rM, poles);
            double alpha = Math.min(1.0, a.magnetWidthM() / tau);
            return 2.0 / Math.PI * tau
                    * HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tau, lm, halfGapM, halfLayerM);
        };
        UnivariateFunction flux1d = rM -> {
            double tau = AxialDualRotor.polePitchAtM(rM, poles);
            return 2.0 / Math.PI * tau
                    * HarmonicGapField.squareWaveFundamentalT(bg1dT, Math.min(1.0, a.magnetWidthM() / tau));
        };
        double volumeM3 = a.magnetVolumeM3(poles);
        List<String> warnings = new ArrayList<>(grade.temperatureWarnings(magnetTempC));
        if (alphaC < 0.3) {
            warnings.add(String.format(Locale.ROOT, "pole-arc ratio %.2f at the magnet centre radius is low: most of "
                    + "each pole pitch carries no magnet, so the EMF is small and rich in harmonics", alphaC));
        }
        return new GapField(brT, tauCM, alphaC, 1.0, gapM, bg1dT, b11dT, b1T, reported(bv),
                peak(bv, tauCM, a.clearancePerSideM()),
                integrate(flux1d, a), integrate(flux2d, a), b1T / b11dT,
                volumeM3, volumeM3 * grade.material().densityKgPerM3(),
                "normal flux density averaged over the coil layer thickness, at the magnet centre radius; "
                        + "flux integrated over the magnet's radial length", warnings);
    }

    private static double integrate(UnivariateFunction f, AxialDualRotor a) {
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(GAUSS_POINTS,
                INTEGRATION_RELATIVE_ACCURACY, INTEGRATION_ABSOLUTE_ACCURACY);
        return integrator.integrate(INTEGRATION_MAX_EVALUATIONS, f, a.innerRadiusM(), a.outerRadiusM());
    }

    private static List<HarmonicAmplitude> reported(IntToDoubleFunction bv) {
        List<HarmonicAmplitude> out = new ArrayList<>();
        for (int v = 1; v <= REPORTED_MAX_ORDER; v += 2) {
            out.add(HarmonicAmplitude.of(v, bv.applyAsDouble(v)));
        }
        return out;
    }

    /** Sum of the cosine coefficients at the pole centre; {@code decayLengthM} is the evaluation layer's
     *  nearest distance to the magnet face, which sets how fast the series converges. */
    private static double peak(IntToDoubleFunction bv, double polePitchM, double decayLengthM) {
        double neededOrder = PEAK_DECAY_EXPONENT * polePitchM / (Math.PI * decayLengthM);
        int maxOrder = (int) Math.min(2_000_001, Math.max(PEAK_MAX_ORDER, neededOrder));
        double sum = 0.0;
        for (int v = 1; v <= maxOrder; v += 2) {
            sum += bv.applyAsDouble(v);
        }
        return sum;
    }
}
