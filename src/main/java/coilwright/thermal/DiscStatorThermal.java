package coilwright.thermal;

import coilwright.machine.AirCoredStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.validation.Checks;

/**
 * Thermal network of an air-cored coil stator cast in resin between the two magnet discs of an axial-flux
 * machine. Three nodes: winding (mean copper), stator faces under the magnets, rotor (discs and magnets).
 * <ul>
 * <li>winding to stator faces: conduction across the coil layer, a slab with uniform heating cooled on both faces:
 *     mean rise Q t / (12 k A), hot spot 1.5 times that, with k across the wires from
 *     {@link ThermalMaterials#acrossWiresWPerMK};</li>
 * <li>the part of the coil ring outside the magnet annulus (legs' outer halves, end turns): the same conduction in
 *     series with convection and radiation from both faces and the rims, the air driven by the rotor
 *     ({@link Convection#rotatingDiscH} at the disc radius) blended with natural convection;</li>
 * <li>stator faces to rotor across the running clearance: the larger of conduction across the clearance
 *     (k / s, laminar Couette flow) and rotor-driven convection (two surfaces in series);</li>
 * <li>rotor to ambient: the outer face of each disc as a free rotating disc (Cobb &amp; Saunders 1956) blended with
 *     natural convection, plus radiation.</li>
 * </ul>
 * Not modelled: radial air pumped through the running clearance (ignoring it errs on the hot side), wind on the
 * discs, and conduction into the stator's mounting. Uncertainty of the temperature rise about +-40 %.
 *
 * @param magnetInnerRadiusM  inner edge of the magnets, m
 * @param magnetOuterRadiusM  outer edge of the magnets, m
 * @param coilRingInnerRadiusM inner edge of the coils, m (&lt;= magnetInnerRadiusM)
 * @param coilRingOuterRadiusM outer edge of the coils, m (&gt;= magnetOuterRadiusM)
 * @param coilLayerThicknessM    thickness of the coil layer, m, 0.001 to 0.1
 * @param clearancePerSideM   clearance between stator and magnets on each side, m, 0.0001 to 0.02
 * @param rotorDiscRadiusM    outer radius of the steel discs, m (&gt;= magnetOuterRadiusM)
 * @param copperFill          copper share of the coil ring's volume, 0.05 to 0.8
 * @param resinConductivityWPerMK conductivity of the casting resin, W/(m K), 0.05 to 5
 * @param emissivity          emissivity of resin and disc surfaces, 0 to 1
 */
public record DiscStatorThermal(double magnetInnerRadiusM, double magnetOuterRadiusM, double coilRingInnerRadiusM,
                                double coilRingOuterRadiusM, double coilLayerThicknessM, double clearancePerSideM,
                                double rotorDiscRadiusM, double copperFill, double resinConductivityWPerMK,
                                double emissivity) implements ThermalModel {
    /** How far the steel discs reach beyond the magnets when not given, m (common practice). */
    public static final double DEFAULT_DISC_OVERHANG_M = 0.01;
    static final String WINDING = "winding";
    static final String FACES = "stator faces";
    static final String ROTOR = "rotor discs and magnets";

    public DiscStatorThermal {
        Checks c = new Checks();
        c.range("magnetInnerRadiusM", magnetInnerRadiusM, 0.001, 3);
        c.range("magnetOuterRadiusM", magnetOuterRadiusM, 0.002, 3);
        c.range("coilRingInnerRadiusM", coilRingInnerRadiusM, 0.0, 3);
        c.range("coilRingOuterRadiusM", coilRingOuterRadiusM, 0.002, 3.5);
        c.range("coilLayerThicknessM", coilLayerThicknessM, 0.001, 0.1);
        c.range("clearancePerSideM", clearancePerSideM, 0.0001, 0.02);
        c.range("rotorDiscRadiusM", rotorDiscRadiusM, 0.002, 3.5);
        c.range("copperFill", copperFill, 0.05, 0.8);
        c.range("resinConductivityWPerMK", resinConductivityWPerMK, 0.05, 5);
        c.range("emissivity", emissivity, 0, 1);
        if (!c.hasErrors()) {
            c.require(magnetOuterRadiusM > magnetInnerRadiusM, "magnetOuterRadiusM", magnetOuterRadiusM,
                    "must exceed magnetInnerRadiusM = " + Checks.fmt(magnetInnerRadiusM), "> magnetInnerRadiusM");
            c.require(coilRingInnerRadiusM <= magnetInnerRadiusM, "coilRingInnerRadiusM", coilRingInnerRadiusM,
                    "must be <= magnetInnerRadiusM = " + Checks.fmt(magnetInnerRadiusM), "<= magnetInnerRadiusM");
            c.require(coilRingOuterRadiusM >= magnetOuterRadiusM, "coilRingOuterRadiusM", coilRingOuterRadiusM,
                    "must be >= magnetOuterRadiusM = " + Checks.fmt(magnetOuterRadiusM), ">= magnetOuterRadiusM");
            c.require(rotorDiscRadiusM >= magnetOuterRadiusM, "rotorDiscRadiusM", rotorDiscRadiusM,
                    "must be >= magnetOuterRadiusM = " + Checks.fmt(magnetOuterRadiusM), ">= magnetOuterRadiusM");
        }
        c.throwIfAny();
    }

    /**
     * The network for a dual rotor and its coils: the coil ring reaches one leg width beyond the magnets on each
     * side (the coil holes span the magnets' radial length), the discs {@link #DEFAULT_DISC_OVERHANG_M} beyond the
     * magnets, unfilled casting resin, emissivity 0.9.
     *
     * @param copperFill copper volume of all coils / volume of the coil ring, 0.05 to 0.8
     */
    public static DiscStatorThermal of(AxialDualRotor rotor, AirCoredStator stator, double copperFill) {
        double leg = stator.conductorBandWidthM();
        return new DiscStatorThermal(rotor.innerRadiusM(), rotor.outerRadiusM(),
                Math.max(0.0, rotor.innerRadiusM() - leg), rotor.outerRadiusM() + leg, rotor.coilLayerThicknessM(),
                rotor.clearancePerSideM(), rotor.outerRadiusM() + DEFAULT_DISC_OVERHANG_M, copperFill,
                ThermalMaterials.CASTING_RESIN, ThermalMaterials.PAINTED_EMISSIVITY);
    }

    /** A copy with another resin conductivity (e.g. {@link ThermalMaterials#FILLED_CASTING_RESIN}). */
    public DiscStatorThermal withResinConductivityWPerMK(double k) {
        return new DiscStatorThermal(magnetInnerRadiusM, magnetOuterRadiusM, coilRingInnerRadiusM,
                coilRingOuterRadiusM, coilLayerThicknessM, clearancePerSideM, rotorDiscRadiusM, copperFill, k, emissivity);
    }

    /** Stator area under the magnets (one face), m^2. */
    double activeAreaM2() {
        return Math.PI * (sq(magnetOuterRadiusM) - sq(magnetInnerRadiusM));
    }

    /** Coil-ring area outside the magnet annulus (one face), m^2. */
    double exposedAreaM2() {
        return Math.PI * (sq(coilRingOuterRadiusM) - sq(coilRingInnerRadiusM)) - activeAreaM2();
    }

    @Override
    public ThermalSolution solve(CoolingConditions cc, HeatSources heat) {
        double kEq = ThermalMaterials.acrossWiresWPerMK(resinConductivityWPerMK, copperFill);
        double gActive = 12 * kEq * activeAreaM2() / coilLayerThicknessM;
        double[] q = {heat.windingW() + heat.statorIronW(), 0, heat.rotorW() + heat.bearingW()};
        NetworkIteration.Result r = NetworkIteration.solve(3, t -> network(cc, t, kEq, gActive), q, cc.ambientC());
        double[] t = r.temperaturesC();
        // heat made in the coil layer makes its middle hottest; heat reaching it from the faces (bearings) does not
        double hotSpot = t[0] + 0.5 * Math.max(0, t[0] - t[1]);
        return new ThermalSolution(t[0], hotSpot, t[2], ThermalSolutions.nodes(r.network(), t), heat.totalW(),
                r.network().heatToAmbientW(t, cc.ambientC()), cc.ambientC(), r.passes());
    }

    private ThermalNetwork network(CoolingConditions cc, double[] t, double kEq, double gActive) {
        double amb = cc.ambientC();
        double w = cc.omegaRadS();
        ThermalNetwork net = new ThermalNetwork();
        int wn = net.node(WINDING);
        int fn = net.node(FACES);
        int rn = net.node(ROTOR);
        net.link(wn, fn, gActive);
        // exposed coil ring: conduction to its faces, then convection and radiation from faces and rims
        double exposed = exposedAreaM2();
        if (exposed > 0) {
            double surfaceC = (t[wn] + amb) / 2;
            double hForced = Convection.rotatingDiscH(rotorDiscRadiusM, w, film(surfaceC, amb));
            double hNatural = Convection.naturalVerticalPlateH(2 * coilRingOuterRadiusM, surfaceC, amb);
            double h = Convection.combined(hForced, hNatural) + Convection.radiationH(emissivity, surfaceC, amb);
            double surface = 2 * exposed + 2 * Math.PI * (coilRingOuterRadiusM + coilRingInnerRadiusM) * coilLayerThicknessM;
            double gCond = 12 * kEq * exposed / coilLayerThicknessM;
            net.toAmbient(wn, series(gCond, h * surface));
        }
        // running clearance: conduction across it or rotor-driven convection on both surfaces in series
        double filmGap = (t[fn] + t[rn]) / 2;
        double hGap = Math.max(Air.conductivityWPerMK(Air.clampC(filmGap)) / clearancePerSideM,
                Convection.rotatingDiscH(magnetOuterRadiusM, w, filmGap) / 2);
        net.link(fn, rn, hGap * 2 * activeAreaM2());
        // outer faces of both discs
        double discArea = Math.PI * sq(rotorDiscRadiusM);
        double hDisc = Convection.combined(Convection.rotatingDiscH(rotorDiscRadiusM, w, film(t[rn], amb)),
                Convection.naturalVerticalPlateH(2 * rotorDiscRadiusM, t[rn], amb))
                + Convection.radiationH(emissivity, t[rn], amb);
        net.toAmbient(rn, hDisc * 2 * discArea);
        return net;
    }

    private static double film(double surfaceC, double ambientC) {
        return (surfaceC + ambientC) / 2;
    }

    static double series(double a, double b) {
        return a <= 0 || b <= 0 ? 0 : 1 / (1 / a + 1 / b);
    }

    private static double sq(double x) {
        return x * x;
    }
}
