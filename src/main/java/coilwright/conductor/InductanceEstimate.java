package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * An estimated phase inductance with its relative uncertainty and the method used.
 *
 * @param phaseInductanceH    phase inductance, H
 * @param relativeUncertainty e.g. 0.3 for +-30 %
 * @param method              the formula and what it neglects, in words
 */
public record InductanceEstimate(double phaseInductanceH, double relativeUncertainty, String method) {
    /** Permeability of free space, H/m. */
    public static final double MU0 = 4e-7 * Math.PI;
    /** Relative uncertainty stated for the air-cored estimate. */
    public static final double AIR_CORED_UNCERTAINTY = 0.5;
    /** Relative uncertainty stated for the slotted estimate. */
    public static final double SLOTTED_UNCERTAINTY = 0.3;

    public InductanceEstimate {
        new Checks().positive("phaseInductanceH", phaseInductanceH)
                .rangeExclusiveMin("relativeUncertainty", relativeUncertainty, 0.0, 1.0)
                .present("method", method).throwIfAny();
    }

    /** Reactance X = 2*pi*f*L at an electrical frequency (&gt;= 0 Hz), Ohm. */
    public double reactanceOhm(double electricalFrequencyHz) {
        new Checks().nonNegative("electricalFrequencyHz", electricalFrequencyHz).throwIfAny();
        return 2.0 * Math.PI * electricalFrequencyHz * phaseInductanceH;
    }

    /**
     * Wheeler's formula for a multilayer circular air-core coil (H. A. Wheeler, "Simple inductance formulas
     * for radio coils", Proc. IRE 16(10), 1928): L[uH] = 0.8 a^2 N^2 / (6a + 9b + 10c) with dimensions in
     * inches, here in SI: L = (0.8e-6/0.0254) a^2 N^2 / (6a + 9b + 10c), a, b, c in m. Stated accuracy
     * about 1 % when the three denominator terms are of similar size.
     *
     * @param turns        N, &gt;= 1
     * @param meanRadiusM  a, mean radius of the winding, m, &gt; 0
     * @param axialLengthM b, length of the coil along its axis, m, &gt; 0
     * @param radialDepthM c, radial depth of the winding, m, &gt; 0
     * @return inductance, H
     */
    public static double wheelerMultilayerH(double turns, double meanRadiusM, double axialLengthM,
                                            double radialDepthM) {
        new Checks().range("turns", turns, 1.0, 1e6).positive("meanRadiusM", meanRadiusM)
                .positive("axialLengthM", axialLengthM).positive("radialDepthM", radialDepthM).throwIfAny();
        double a = meanRadiusM;
        return 0.8e-6 / 0.0254 * a * a * turns * turns / (6 * a + 9 * axialLengthM + 10 * radialDepthM);
    }

    /**
     * Phase inductance of an air-cored disc stator. Each flat coil is replaced by the circular coil of the
     * same mean turn length (mean radius MLT/(2*pi)), radial depth = leg width and axial length = coil
     * thickness, and Wheeler's multilayer formula gives L_coil. Phase: L = coilsPerPhase * L_coil / paths^2.
     * Mutual coupling between the coils of a phase and the effect of the rotor discs' iron are neglected,
     * hence the wide +-50 % uncertainty.
     */
    public static InductanceEstimate airCored(AirCoredInductanceInput in) {
        new Checks().present("input", in).throwIfAny();
        double meanRadius = in.meanTurnLengthM() / (2.0 * Math.PI);
        double coil = wheelerMultilayerH(in.turnsPerCoil(), meanRadius, in.coilThicknessM(), in.legWidthM());
        double paths = in.parallelPaths();
        double phase = in.coilsPerPhase() * coil / (paths * paths);
        return new InductanceEstimate(phase, AIR_CORED_UNCERTAINTY,
                "Wheeler (1928) multilayer-coil formula on the equal-perimeter circular coil; coils per phase "
                        + "times coil inductance over paths squared; mutual coupling between coils and the "
                        + "rotor iron neglected");
    }

    /**
     * Magnetizing (air-gap) inductance of an m-phase winding with sinusoidal MMF, the synchronous value
     * with all phases carrying a balanced set of currents:
     * L_m = (m/2) * (4/pi) * mu0 * (kw1*N_ph)^2 * r * L / (p^2 * g_eff) for m &gt;= 2, and the phase self
     * inductance (4/pi) * mu0 * (kw1*N_ph)^2 * r * L / (p^2 * g_eff) for m = 1; r the air-gap radius.
     * (Standard result of the fundamental-MMF field, e.g. Hendershot &amp; Miller 2010; Pyrhonen et al.
     * 2008 section 3.12; from memory.)
     */
    public static double magnetizingInductanceH(SlottedInductanceInput in) {
        double kwN = in.windingFactor() * in.seriesTurnsPerPhase();
        double p = in.polePairs();
        double single = 4.0 / Math.PI * MU0 * kwN * kwN * in.airGapRadiusM() * in.stackLengthM()
                / (p * p * in.effectiveAirGapM());
        return in.phases() == 1 ? single : in.phases() / 2.0 * single;
    }

    /**
     * Slot leakage L_slot = (4m/Q) * mu0 * L * N_ph^2 * lambda, with the permeance factor of a rectangular
     * slot lambda = h/(3b) + h0/b0 (Pyrhonen et al. 2008 section 4.2, from memory). All coil sides of a
     * slot are counted as one phase (mutual slot leakage of mixed-phase slots neglected).
     */
    public static double slotLeakageInductanceH(SlottedInductanceInput in) {
        double lambda = in.slotConductorHeightM() / (3.0 * in.slotWidthM())
                + in.slotOpeningHeightM() / in.slotOpeningWidthM();
        double n = in.seriesTurnsPerPhase();
        return 4.0 * in.phases() / in.slots() * MU0 * in.stackLengthM() * n * n * lambda;
    }

    /**
     * End-winding leakage by a permeance-factor coefficient:
     * L_ew = (4m/Q) * q * mu0 * N_ph^2 * l_ew * lambda_ew, q = Q/(2pm), l_ew the end-winding length of one
     * turn (both ends) (after Pyrhonen et al. 2008 section 4.3, from memory).
     */
    public static double endWindingLeakageInductanceH(SlottedInductanceInput in) {
        double q = in.slots() / (2.0 * in.polePairs() * in.phases());
        double n = in.seriesTurnsPerPhase();
        return 4.0 * in.phases() / in.slots() * q * MU0 * n * n * in.endWindingLengthM() * in.endWindingPermeance();
    }

    /**
     * Synchronous phase inductance of a slotted surface-magnet stator: magnetizing + slot leakage +
     * end-winding leakage, +-30 %. Harmonic (air-gap) leakage and saturation are neglected.
     */
    public static InductanceEstimate slotted(SlottedInductanceInput in) {
        new Checks().present("input", in).throwIfAny();
        double total = magnetizingInductanceH(in) + slotLeakageInductanceH(in) + endWindingLeakageInductanceH(in);
        return new InductanceEstimate(total, SLOTTED_UNCERTAINTY,
                "magnetizing inductance of the fundamental MMF over g_eff = kc*g + lm/mu_rec, plus slot leakage "
                        + "(lambda = h/3b + h0/b0) and end-winding leakage (permeance coefficient); "
                        + "harmonic leakage and saturation neglected");
    }
}
