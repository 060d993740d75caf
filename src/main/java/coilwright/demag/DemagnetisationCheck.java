package coilwright.demag;

import coilwright.magnet.HarmonicGapField;
import coilwright.magnet.MagnetGrade;
import coilwright.validation.Checks;

import java.util.Locale;

/**
 * Worst-case demagnetisation check: a sudden three-phase short circuit at the highest speed, with the magnets at a
 * stated temperature. Method:
 * <ol>
 * <li>peak fault current i_p from {@link ShortCircuitCurrent} (IEC 60909-0 peak factor);</li>
 * <li>armature MMF per pole at that current, F = c_m (4/pi) k_w1 N_ph i_p / (2p) with c_m = m/2 for a rotating
 *     three-phase field and 1 for a single phase (the usual winding MMF, e.g. Hanselman 2006, ch. 3), all of it
 *     taken to oppose the magnet (the worst alignment);</li>
 * <li>its field in the magnet from the magnetic circuit: H_a = F / (n_m (l_m + mu_r g)), with g the Carter-scaled
 *     gap or the dual rotor's half gap and n_m the magnets the MMF acts across;</li>
 * <li>the magnet's own open-circuit field at its most exposed part, from the 2-D harmonic solution: B_y at the
 *     magnet face is sum B_v cosh(k g) cos(k x), averaged over the outer tenth of the magnet width (where the field
 *     fringes to the neighbouring pole) and over a strip as wide at the pole centre, and H = (B_y - Br(T)) /
 *     (mu0 mu_r) taken where it opposes most (the edge for a small gap, the centre when a large gap leaves the
 *     magnet's sides a shorter path to its neighbours than across the gap);</li>
 * <li>the sum compared with the knee of the intrinsic curve at that temperature, H_k = 0.9 HcJ(T) (a squareness
 *     H_k / HcJ of about 0.9 for sintered NdFeB and hard ferrite; from memory).</li>
 * </ol>
 * Margin = 1 - |H| / H_k: negative means the knee is crossed and the magnets lose flux for good.
 *
 * @param magnetTempC               magnet temperature checked, C
 * @param intrinsicCoercivityKAPerM HcJ at that temperature, kA/m
 * @param kneeFieldKAPerM           H_k, kA/m (opposing field the magnet tolerates)
 * @param openCircuitFieldKAPerM    opposing field at the magnet's most exposed part (edge or centre) without current,
 *                                  kA/m
 * @param armatureFieldKAPerM       opposing field of the fault current, kA/m
 * @param worstFieldKAPerM          their sum, kA/m
 * @param shortCircuit              the fault current
 * @param margin                    1 - worst / knee (negative: demagnetised)
 * @param verdict                   OK, WARNING or DANGER
 * @param method                    the method in words
 */
public record DemagnetisationCheck(double magnetTempC, double intrinsicCoercivityKAPerM, double kneeFieldKAPerM,
                                   double openCircuitFieldKAPerM, double armatureFieldKAPerM, double worstFieldKAPerM,
                                   ShortCircuitCurrent shortCircuit, double margin, Verdict verdict, String method) {
    /** Knee of the intrinsic curve as a share of HcJ (from memory, see the class description). */
    public static final double SQUARENESS = 0.9;
    /** A margin below this is reported as a WARNING (common practice: keep 20 % in hand for tolerances). */
    public static final double WARNING_MARGIN = 0.2;
    /** Share of the magnet width, at its edge, over which the exposed-edge field is averaged. */
    static final double EDGE_STRIP = 0.1;
    private static final double MU0 = 4e-7 * Math.PI;
    private static final int MAX_ORDER = 401;
    static final String METHOD = "sudden 3-phase short circuit at the highest speed (IEC 60909 peak factor); "
            + "winding MMF fully opposing; 2-D open-circuit field at the magnet's edge or centre, whichever is worse; "
            + "knee at 0.9 HcJ(T)";

    /**
     * The check at one magnet temperature.
     *
     * @param circuit                 magnet and gap
     * @param magnetTempC             magnet temperature, C, -60 to 300
     * @param phases                  1 or 3
     * @param poles                   2p
     * @param seriesTurnsPerPhase     N_ph
     * @param fundamentalWindingFactor k_w1, 0 to 1
     * @param shortCircuit            the fault current at the highest speed (EMF at this magnet temperature)
     */
    public static DemagnetisationCheck of(MagnetCircuit circuit, double magnetTempC, int phases, int poles,
                                          int seriesTurnsPerPhase, double fundamentalWindingFactor,
                                          ShortCircuitCurrent shortCircuit) {
        new Checks().present("circuit", circuit).range("magnetTempC", magnetTempC, -60, 300)
                .require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3")
                .intRange("poles", poles, 2, 400).intRange("seriesTurnsPerPhase", seriesTurnsPerPhase, 1, 1_000_000)
                .range("fundamentalWindingFactor", fundamentalWindingFactor, 0, 1).present("shortCircuit", shortCircuit)
                .throwIfAny();
        MagnetGrade g = circuit.grade();
        double mu = g.recoilPermeability();
        double lm = circuit.magnetThicknessM();
        double gap = circuit.gapToFacingM();
        double phaseShare = phases == 3 ? 1.5 : 1.0;
        double mmfA = phaseShare * 4 / Math.PI * fundamentalWindingFactor * seriesTurnsPerPhase * shortCircuit.peakA()
                / poles;
        double armature = mmfA / (circuit.magnetsPerPole() * (lm + mu * gap));
        double br = g.remanenceAt(magnetTempC);
        double openCircuit = (br - Math.min(edgeFluxDensityT(circuit, br), centreFluxDensityT(circuit, br)))
                / (MU0 * mu);
        double hcj = g.intrinsicCoercivityAt(magnetTempC);
        double knee = SQUARENESS * hcj;
        double worst = (openCircuit + armature) / 1000;
        double margin = knee > 0 ? 1 - worst / knee : Double.NEGATIVE_INFINITY;
        Verdict v = margin < 0 ? Verdict.DANGER : margin < WARNING_MARGIN ? Verdict.WARNING : Verdict.OK;
        return new DemagnetisationCheck(magnetTempC, hcj, knee, openCircuit / 1000, armature / 1000, worst,
                shortCircuit, Math.max(margin, -1e3), v, METHOD);
    }

    /**
     * The worse of two checks, e.g. hottest (NdFeB's weak point) and coldest (ferrite's).
     */
    public static DemagnetisationCheck worse(DemagnetisationCheck a, DemagnetisationCheck b) {
        return a.margin() <= b.margin() ? a : b;
    }

    /** Normal flux density at the magnet face averaged over the outer strip of its width, T. */
    static double edgeFluxDensityT(MagnetCircuit c, double br) {
        double half = c.poleArcRatio() * c.polePitchM() / 2;
        return faceFluxDensityT(c, br, half - EDGE_STRIP * 2 * half, half);
    }

    /** Normal flux density at the magnet face averaged over a strip of the same width at the pole centre, T. */
    static double centreFluxDensityT(MagnetCircuit c, double br) {
        double strip = EDGE_STRIP * c.poleArcRatio() * c.polePitchM();
        return faceFluxDensityT(c, br, -strip / 2, strip / 2);
    }

    /**
     * Normal flux density at the magnet face averaged from {@code fromM} to {@code toM} (distances from the pole
     * centre), T: the 2-D solution's harmonics grown from the facing surface to the magnet face by cosh(k g).
     */
    static double faceFluxDensityT(MagnetCircuit c, double br, double fromM, double toM) {
        double tau = c.polePitchM();
        double width = toM - fromM;
        double sum = 0;
        for (int v = 1; v <= MAX_ORDER; v += 2) {
            double k = v * Math.PI / tau;
            double atFacing = HarmonicGapField.normalFluxDensityT(v, br, c.grade().recoilPermeability(),
                    c.poleArcRatio(), tau, c.magnetThicknessM(), c.gapToFacingM(), 0.0);
            double atFace = atFacing * Math.cosh(k * c.gapToFacingM());
            if (!Double.isFinite(atFace)) {
                break;
            }
            sum += atFace * (Math.sin(k * toM) - Math.sin(k * fromM)) / (k * width);
        }
        return sum;
    }

    /** One line for a caution: verdict, margin and fields. */
    public String summary() {
        return String.format(Locale.ROOT, "worst opposing field %.0f kA/m (%.0f from the magnet's own edge, %.0f from "
                        + "a %.0f A peak short-circuit current) against a knee of %.0f kA/m at %.0f C: margin %.0f %%",
                worstFieldKAPerM, openCircuitFieldKAPerM, armatureFieldKAPerM, shortCircuit.peakA(), kneeFieldKAPerM,
                magnetTempC, 100 * margin);
    }
}
