package coilwright.losses;

import coilwright.conductor.Copper;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.HarmonicGapField;
import coilwright.magnet.MagnetGrade;
import coilwright.validation.Checks;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Eddy-current loss in round conductors crossed by an alternating magnetic field, as in the coils of an air-cored
 * stator that sit in the magnets' field. For a round conductor of diameter d, small against the skin depth, in a
 * uniform sinusoidal field of peak B at right angles to it:
 * <pre>  P = pi l d^4 omega^2 B^2 / (128 rho)</pre>
 * (Sullivan, "Optimal choice for number of strands in a litz-wire transformer winding", IEEE Trans. Power
 * Electron. 14(2), 1999; it follows from J = sigma x dB/dt integrated over the circle). Per unit copper volume this
 * is d^2 omega^2 B^2 / (32 rho): it grows with the square of the wire diameter and of the frequency, which is why
 * a conductor is split into strands in hand: n strands of the same total copper area carry 1/n of the loss.
 */
public final class ConductorEddyLoss {
    /** Highest harmonic order summed. */
    static final int MAX_ORDER = 49;
    private static final double MU0 = 4e-7 * Math.PI;
    private static final int GAUSS_POINTS = 5;
    private static final double MAX_SINH_ARGUMENT = 600;

    private ConductorEddyLoss() {
    }

    /**
     * Loss per metre of one round conductor, W/m.
     *
     * @param diameterM              bare conductor diameter d, m, &gt; 0
     * @param peakFluxDensityT       peak of the sinusoidal field across the conductor, T, &gt;= 0
     * @param angularFrequencyRadS   omega = 2 pi f, rad/s, &gt;= 0
     * @param resistivityOhmM        conductor resistivity, Ohm m, &gt; 0
     */
    public static double perMetreW(double diameterM, double peakFluxDensityT, double angularFrequencyRadS,
                                   double resistivityOhmM) {
        new Checks().positive("diameterM", diameterM).nonNegative("peakFluxDensityT", peakFluxDensityT)
                .nonNegative("angularFrequencyRadS", angularFrequencyRadS).positive("resistivityOhmM", resistivityOhmM)
                .throwIfAny();
        return Math.PI * Math.pow(diameterM, 4) * Math.pow(angularFrequencyRadS * peakFluxDensityT, 2)
                / (128 * resistivityOhmM);
    }

    /** Skin depth sqrt(2 rho / (omega mu0)), m: the formula above holds while d is well below it. */
    public static double skinDepthM(double frequencyHz, double resistivityOhmM) {
        new Checks().positive("frequencyHz", frequencyHz).positive("resistivityOhmM", resistivityOhmM).throwIfAny();
        return Math.sqrt(2 * resistivityOhmM / (2 * Math.PI * frequencyHz * MU0));
    }

    /**
     * Eddy loss in the coil legs of an air-cored axial-flux stator. The field in the coil layer is the 2-D harmonic
     * solution of {@link HarmonicGapField} for the symmetric dual rotor: at distance y from the mid-plane harmonic v
     * has a normal part B_v cosh(k y) and a tangential part B_v sinh(k y) in quadrature, so a conductor sees
     * B_v^2 cosh(2 k y), whose mean over the layer thickness h is B_v^2 sinh(k h) / (k h). Harmonic v alternates
     * at v omega. The loss is integrated over the magnets' radial length with the local pole pitch; end turns
     * (outside the magnets) are left out.
     *
     * @param rotor             the dual rotor
     * @param poles             number of poles 2p
     * @param magnetTempC       magnet temperature, C
     * @param coils             number of coils, &gt;= 1
     * @param turnsPerCoil      turns of each coil, &gt;= 1
     * @param strandsInHand     parallel strands per turn, &gt;= 1
     * @param strandDiameterM   bare diameter of one strand, m
     * @param speedRpm          speed, rpm, &gt;= 0
     * @param windingTempC      copper temperature, C (the loss falls as resistivity rises)
     */
    public static AirCoredEddyLoss airCored(AxialDualRotor rotor, int poles, double magnetTempC, int coils,
                                            int turnsPerCoil, int strandsInHand, double strandDiameterM,
                                            double speedRpm, double windingTempC) {
        new Checks().present("rotor", rotor).intRange("poles", poles, 2, 400).intRange("coils", coils, 1, 10_000)
                .intRange("turnsPerCoil", turnsPerCoil, 1, 10_000).intRange("strandsInHand", strandsInHand, 1, 100)
                .range("strandDiameterM", strandDiameterM, 1e-5, 0.01).range("speedRpm", speedRpm, 0, 100_000)
                .throwIfAny();
        MagnetGrade grade = rotor.grade();
        double br = grade.remanenceAt(magnetTempC);
        double mu = grade.recoilPermeability();
        double rho = Copper.resistivityOhmM(windingTempC);
        double omega = poles / 2.0 * speedRpm * Math.PI / 30.0;
        double halfGap = rotor.magneticGapM() / 2;
        double h = rotor.coilLayerThicknessM();
        double conductors = 2.0 * coils * turnsPerCoil * strandsInHand;
        UnivariateFunction meanSquare = r -> {
            double tau = 2 * Math.PI * r / poles;
            double alpha = Math.min(1.0, rotor.magnetWidthM() / tau);
            double sum = 0;
            for (int v = 1; v <= MAX_ORDER; v += 2) {
                double k = v * Math.PI / tau;
                if (k * h > MAX_SINH_ARGUMENT) {
                    break; // the field at such orders has decayed by exp(-2 k clearance) and adds nothing
                }
                double bv = HarmonicGapField.normalFluxDensityT(v, br, mu, alpha, tau, rotor.magnetThicknessM(),
                        halfGap, 0.0);
                sum += v * v * bv * bv * Math.sinh(k * h) / (k * h);
            }
            return sum;
        };
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(GAUSS_POINTS, 1e-8, 1e-14);
        double integral = integrator.integrate(100_000, meanSquare, rotor.innerRadiusM(), rotor.outerRadiusM());
        double perUnit = Math.PI * Math.pow(strandDiameterM, 4) * omega * omega / (128 * rho);
        double total = conductors * perUnit * integral;
        UnivariateFunction first = r -> {
            double tau = 2 * Math.PI * r / poles;
            double k = Math.PI / tau;
            double b1 = HarmonicGapField.normalFluxDensityT(1, br, mu, Math.min(1.0, rotor.magnetWidthM() / tau), tau,
                    rotor.magnetThicknessM(), halfGap, 0.0);
            return b1 * b1 * Math.sinh(k * h) / (k * h);
        };
        double fundamentalShare = integral > 0 ? integrator.integrate(100_000, first, rotor.innerRadiusM(),
                rotor.outerRadiusM()) / integral : 1.0;
        double f = omega / (2 * Math.PI);
        double skin = f > 0 ? skinDepthM(f, rho) : Double.MAX_VALUE;
        return new AirCoredEddyLoss(total, fundamentalShare, strandDiameterM, strandsInHand,
                Math.min(skin, 1.0), strandDiameterM < skin);
    }

    /**
     * Eddy loss in the air-cored coils, W.
     *
     * @param totalW                  loss in all coil legs, W
     * @param fundamentalShare        share of it due to the fundamental field, 0 to 1
     * @param strandDiameterM         bare strand diameter, m
     * @param strandsInHand           strands per turn
     * @param skinDepthAtFundamentalM copper skin depth at the fundamental frequency, m (1 m at standstill)
     * @param thinAgainstSkinDepth    true when the strand is thinner than that skin depth (the formula's premise)
     */
    public record AirCoredEddyLoss(double totalW, double fundamentalShare, double strandDiameterM, int strandsInHand,
                                   double skinDepthAtFundamentalM, boolean thinAgainstSkinDepth) {
    }
}
