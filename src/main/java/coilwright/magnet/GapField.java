package coilwright.magnet;

import java.util.List;

/**
 * The air-gap field and flux of one rotor design at one magnet temperature. SI units.
 *
 * @param remanenceAtTempT         magnet remanence at the magnet temperature, T
 * @param polePitchM               pole pitch at the gap diameter (radial) or magnet centre radius (axial), m
 * @param poleArcRatio             magnet arc / pole pitch at the same place
 * @param carterCoefficient        Carter's coefficient (1 for the air-cored axial stator)
 * @param effectiveGapM            radial: k_c * airGapM; axial: total magnetic gap between magnet faces, m
 * @param gapFluxDensity1dT        flat-top gap flux density of the 1-D magnetic circuit, T
 * @param fundamentalAmplitude1dT  (4/pi) * gapFluxDensity1dT * sin(alpha_p pi/2), T
 * @param fundamentalAmplitude2dT  fundamental of the 2-D harmonic solution, T (the value used)
 * @param harmonicAmplitudes       2-D harmonics of odd order 1..13
 * @param peakFluxDensity2dT       2-D flux density at the pole centre (sum of odd harmonics, at least up to
 *                                 {@link GapFieldCalculator#PEAK_MAX_ORDER} and on until they are negligible), T
 * @param fluxPerPole1dWb          fundamental flux per pole from the 1-D model, Wb
 * @param fluxPerPoleWb            fundamental flux per pole from the 2-D model, Wb (the value used for EMF)
 * @param leakageRatio             fundamentalAmplitude2dT / fundamentalAmplitude1dT (at most about 1)
 * @param magnetVolumeM3           total magnet volume, m^3
 * @param magnetMassKg             total magnet mass, kg
 * @param fieldEvaluation          where the field is evaluated, in words
 * @param warnings                 cautions (magnet temperature, demagnetisation risk)
 */
public record GapField(double remanenceAtTempT, double polePitchM, double poleArcRatio, double carterCoefficient,
                       double effectiveGapM, double gapFluxDensity1dT, double fundamentalAmplitude1dT,
                       double fundamentalAmplitude2dT, List<HarmonicAmplitude> harmonicAmplitudes,
                       double peakFluxDensity2dT, double fluxPerPole1dWb, double fluxPerPoleWb, double leakageRatio,
                       double magnetVolumeM3, double magnetMassKg, String fieldEvaluation, List<String> warnings) {
    public GapField {
        harmonicAmplitudes = List.copyOf(harmonicAmplitudes);
        warnings = List.copyOf(warnings);
    }

    /** The 2-D amplitude of odd harmonic {@code order} (1..13), T. */
    public double amplitudeT(int order) {
        return harmonicAmplitudes.stream().filter(h -> h.order() == order).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("order = " + order + ": must be odd, 1 to 13"))
                .amplitudeT();
    }
}
