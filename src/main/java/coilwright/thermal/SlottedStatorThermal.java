package coilwright.thermal;

import coilwright.machine.SlottedStator;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.Checks;

/**
 * Thermal network of a slotted iron stator, after the lumped-parameter models of Mellor, Roberts &amp; Turner
 * (IEE Proc. B 138(5), 1991) and Staton, Boglietti &amp; Cavagnino (IEEE Trans. Energy Convers. 20(3), 2005),
 * reduced to the paths that matter in a small generator. Nodes: winding (slot and end copper together, since copper
 * conducts along the turns far better than across), stator core, rotor (magnets), and for an inner rotor the
 * housing and, when enclosed, the internal air.
 * <ul>
 * <li>winding to core, per slot: conduction across the slot's copper and varnish (a slab of the slot width cooled
 *     on both walls, k from {@link ThermalMaterials#acrossWiresWPerMK}) in series with the liner and a liner-to-iron
 *     air layer over the two walls and the bottom;</li>
 * <li>end windings to the end-space air: {@link Convection#endSpaceH} at the rotor's peripheral speed;</li>
 * <li>core to housing: radial conduction through half the yoke and the core-to-housing interface gap;</li>
 * <li>core to rotor across the air gap: Becker &amp; Kaye ({@link Convection#airGapH});</li>
 * <li>housing to ambient: natural convection (Churchill &amp; Chu) blended with forced flow along the housing from an
 *     external air speed, plus radiation; end shields as vertical plates.</li>
 * </ul>
 * An outer rotor is its own housing: the rotor shell loses heat as a rotating cylinder ({@link
 * Convection#rotatingCylinderH}) and the stator's ends and bore face open air. Uncertainty of the temperature rise
 * about +-35 %, mostly from the slot's equivalent conductivity and the end-space coefficient.
 *
 * @param side                  INNER (rotor in the bore, stator in a housing) or OUTER (stator inside the rotor)
 * @param gapDiameterM          stator surface diameter at the gap, m, 0.01 to 5
 * @param stackLengthM          stack length, m, 0.002 to 2
 * @param airGapM               mechanical air gap, m, 0.0001 to 0.05
 * @param slots                 number of slots, 2 to 400
 * @param slotDepthM            slot depth available to the winding, m, 0.001 to 0.2
 * @param slotWidthM            slot width, m, 0.0005 to 0.1
 * @param toothTipHeightM       tooth-tip height, m, 0 to 0.02
 * @param slotLinerThicknessM   liner thickness, m, 0 to 0.002
 * @param yokeThicknessM        radial depth of the back iron behind the slots, m, 0.001 to 0.5
 * @param endWindingOverhangM   axial reach of the end windings beyond the stack at each end, m, 0 to 0.5
 * @param housingOuterDiameterM housing (inner rotor) or rotor shell (outer rotor) outer diameter, m, 0.01 to 6
 * @param housingLengthM        housing or rotor shell axial length, m, 0.002 to 3 (&gt;= stackLengthM)
 * @param slotCopperFill        copper area / gross slot area, 0.05 to 0.8
 * @param enclosure             open ventilated or enclosed (inner rotor; an outer rotor is taken as open)
 * @param emissivity            emissivity of the housing or shell, 0 to 1
 */
public record SlottedStatorThermal(RotorSide side, double gapDiameterM, double stackLengthM, double airGapM,
                                   int slots, double slotDepthM, double slotWidthM, double toothTipHeightM,
                                   double slotLinerThicknessM, double yokeThicknessM, double endWindingOverhangM,
                                   double housingOuterDiameterM, double housingLengthM, double slotCopperFill,
                                   Enclosure enclosure, double emissivity) implements ThermalModel {
    /** Housing wall or rotor back-iron thickness added to the core when the housing is not given, m (common practice). */
    public static final double DEFAULT_WALL_M = 0.006;
    /** Axial clearance between end windings and end shield when not given, m (common practice). */
    public static final double DEFAULT_END_CLEARANCE_M = 0.010;
    /** Stacking factor of the laminations (common practice). */
    static final double STACKING = 0.95;
    static final String WINDING = "winding";
    static final String CORE = "stator core";
    static final String ROTOR = "rotor and magnets";
    static final String HOUSING = "housing";
    static final String INTERNAL_AIR = "internal air";

    public SlottedStatorThermal {
        Checks c = new Checks();
        c.present("side", side);
        c.range("gapDiameterM", gapDiameterM, 0.01, 5);
        c.range("stackLengthM", stackLengthM, 0.002, 2);
        c.range("airGapM", airGapM, 0.0001, 0.05);
        c.intRange("slots", slots, 2, 400);
        c.range("slotDepthM", slotDepthM, 0.001, 0.2);
        c.range("slotWidthM", slotWidthM, 0.0005, 0.1);
        c.range("toothTipHeightM", toothTipHeightM, 0, 0.02);
        c.range("slotLinerThicknessM", slotLinerThicknessM, 0, 0.002);
        c.range("yokeThicknessM", yokeThicknessM, 0.001, 0.5);
        c.range("endWindingOverhangM", endWindingOverhangM, 0, 0.5);
        c.range("housingOuterDiameterM", housingOuterDiameterM, 0.01, 6);
        c.range("housingLengthM", housingLengthM, 0.002, 3);
        c.range("slotCopperFill", slotCopperFill, 0.05, 0.8);
        c.present("enclosure", enclosure);
        c.range("emissivity", emissivity, 0, 1);
        c.throwIfAny();
        double bottom = side == RotorSide.INNER ? gapDiameterM / 2 + toothTipHeightM + slotDepthM + yokeThicknessM
                : gapDiameterM / 2 - toothTipHeightM - slotDepthM - yokeThicknessM;
        c.require(side == RotorSide.INNER || bottom > 0, "yokeThicknessM", yokeThicknessM,
                "slots and yoke reach the axis of this outer-rotor stator", "< gapDiameterM / 2 - slot depth");
        c.require(side == RotorSide.OUTER || housingOuterDiameterM >= 2 * bottom, "housingOuterDiameterM",
                housingOuterDiameterM, "must be at least the stator core diameter " + Checks.fmt(2 * bottom),
                ">= " + Checks.fmt(2 * bottom));
        c.require(housingLengthM >= stackLengthM, "housingLengthM", housingLengthM,
                "must be at least stackLengthM = " + Checks.fmt(stackLengthM), ">= stackLengthM");
        c.throwIfAny();
    }

    /**
     * The network for a rotor and stator: end-winding overhang from the mean turn length (each end turn an arc
     * of height length / pi beyond the straight extension), housing {@link #DEFAULT_WALL_M} outside the core (or
     * outside magnets and back iron of an outer rotor) and {@link #DEFAULT_END_CLEARANCE_M} beyond the end windings,
     * emissivity 0.9.
     *
     * @param meanTurnLengthM mean length of one turn, m (from the alternator's coil geometry)
     * @param yokeThicknessM  radial depth of the stator back iron, m
     * @param slotCopperFill  copper area / gross slot area
     */
    public static SlottedStatorThermal of(RadialSurfaceRotor rotor, SlottedStator stator, int slots,
                                          double meanTurnLengthM, double yokeThicknessM, Enclosure enclosure,
                                          double slotCopperFill) {
        new Checks().positive("meanTurnLengthM", meanTurnLengthM).positive("yokeThicknessM", yokeThicknessM)
                .throwIfAny();
        double stack = rotor.stackLengthM();
        double arc = Math.max(0, meanTurnLengthM / 2 - stack - 2 * stator.endExtensionM());
        double overhang = stator.endExtensionM() + arc / Math.PI;
        boolean inner = rotor.side() == RotorSide.INNER;
        double coreRadius = rotor.gapDiameterM() / 2 + stator.toothTipHeightM() + stator.slotDepthM() + yokeThicknessM;
        double housingDiameter = inner ? 2 * (coreRadius + DEFAULT_WALL_M)
                : 2 * (rotor.magnetBackRadiusM() + rotor.magnetThicknessM() + DEFAULT_WALL_M);
        double housingLength = stack + 2 * (overhang + DEFAULT_END_CLEARANCE_M);
        return new SlottedStatorThermal(rotor.side(), rotor.gapDiameterM(), stack, rotor.airGapM(), slots,
                stator.slotDepthM(), stator.slotWidthM(), stator.toothTipHeightM(), stator.slotLinerThicknessM(),
                yokeThicknessM, overhang, housingDiameter, housingLength, slotCopperFill, enclosure,
                ThermalMaterials.PAINTED_EMISSIVITY);
    }

    @Override
    public ThermalSolution solve(CoolingConditions cc, HeatSources heat) {
        boolean inner = side == RotorSide.INNER;
        boolean airNode = inner && enclosure == Enclosure.ENCLOSED;
        int n = inner ? (airNode ? 5 : 4) : 3;
        double[] q = new double[n];
        q[0] = heat.windingW();
        q[1] = heat.statorIronW() + (inner ? 0 : heat.bearingW());
        q[2] = heat.rotorW();
        if (inner) {
            q[3] = heat.bearingW();
        }
        NetworkIteration.Result r = NetworkIteration.solve(n, t -> inner ? innerNetwork(cc, t, airNode)
                : outerNetwork(cc, t), q, cc.ambientC());
        double[] t = r.temperaturesC();
        double slotHeatW = slotConductanceWPerK() * (t[0] - t[1]);
        double internalRiseK = Math.max(0, slotHeatW) / (slots * slabConductanceWPerK());
        return new ThermalSolution(t[0], t[0] + 0.5 * internalRiseK, t[2], ThermalSolutions.nodes(r.network(), t),
                heat.totalW(), r.network().heatToAmbientW(t, cc.ambientC()), cc.ambientC(), r.passes());
    }

    /** Conductance across the copper of one slot to its walls (slab of width w, both walls), W/K. */
    double slabConductanceWPerK() {
        double k = ThermalMaterials.acrossWiresWPerMK(ThermalMaterials.IMPREGNATING_VARNISH, slotCopperFill);
        return 12 * k * slotDepthM * stackLengthM / slotWidthM;
    }

    /** Winding to core through all slots, W/K. */
    double slotConductanceWPerK() {
        double wallArea = (2 * slotDepthM + slotWidthM) * stackLengthM;
        double wallResistance = slotLinerThicknessM / ThermalMaterials.SLOT_LINER
                + ThermalMaterials.LINER_TO_IRON_GAP_M / Air.conductivityWPerMK(60);
        return slots * DiscStatorThermal.series(slabConductanceWPerK(), wallArea / wallResistance);
    }

    private double slotMidRadiusM() {
        double rb = gapDiameterM / 2;
        return side == RotorSide.INNER ? rb + toothTipHeightM + slotDepthM / 2 : rb - toothTipHeightM - slotDepthM / 2;
    }

    private double endWindingAreaM2() {
        return 2 * 2 * Math.PI * slotMidRadiusM() * (2 * endWindingOverhangM + slotDepthM);
    }

    private double coreEndAreaM2(double rOuter, double rInner) {
        double slotShare = Math.min(0.9, slots * slotWidthM / (2 * Math.PI * slotMidRadiusM()));
        return 2 * Math.PI * (rOuter * rOuter - rInner * rInner) * (1 - slotShare * slotDepthM / (rOuter - rInner));
    }

    private ThermalNetwork innerNetwork(CoolingConditions cc, double[] t, boolean airNode) {
        double rb = gapDiameterM / 2;
        double rSlotBottom = rb + toothTipHeightM + slotDepthM;
        double ro = rSlotBottom + yokeThicknessM;
        double vRotor = cc.omegaRadS() * rb;
        double hEnd = Convection.endSpaceH(vRotor);
        ThermalNetwork net = new ThermalNetwork();
        int w = net.node(WINDING);
        int c = net.node(CORE);
        int r = net.node(ROTOR);
        int h = net.node(HOUSING);
        int a = airNode ? net.node(INTERNAL_AIR) : -1;
        net.link(w, c, slotConductanceWPerK());
        net.link(c, r, gapConductance(cc, t[c], t[r]));
        double yokeR = Math.log(ro / ((rSlotBottom + ro) / 2)) / (2 * Math.PI * ThermalMaterials.LAMINATION_IN_PLANE
                * stackLengthM * STACKING);
        double contactR = ThermalMaterials.CORE_TO_HOUSING_GAP_M
                / (Air.conductivityWPerMK(Air.clampC(t[c])) * 2 * Math.PI * ro * stackLengthM);
        net.link(c, h, 1 / (yokeR + contactR));
        double gEnd = hEnd * endWindingAreaM2();
        double gCoreEnd = hEnd * coreEndAreaM2(ro, rb);
        double rotorRadius = rb - airGapM;
        double gRotorEnd = hEnd * 2 * Math.PI * rotorRadius * rotorRadius;
        if (airNode) {
            net.link(w, a, gEnd).link(c, a, gCoreEnd).link(r, a, gRotorEnd);
            double inside = 2 * Math.PI * ro * ro + 2 * Math.PI * ro * (housingLengthM - stackLengthM);
            net.link(a, h, hEnd * inside);
        } else {
            net.toAmbient(w, gEnd).toAmbient(c, gCoreEnd).toAmbient(r, gRotorEnd);
        }
        net.toAmbient(h, housingToAmbient(cc, t[h]));
        return net;
    }

    private ThermalNetwork outerNetwork(CoolingConditions cc, double[] t) {
        double amb = cc.ambientC();
        double rb = gapDiameterM / 2;
        double ri = rb - toothTipHeightM - slotDepthM - yokeThicknessM;
        double vRotor = cc.omegaRadS() * rb;
        double hEnd = Convection.endSpaceH(vRotor);
        ThermalNetwork net = new ThermalNetwork();
        int w = net.node(WINDING);
        int c = net.node(CORE);
        int r = net.node(ROTOR);
        net.link(w, c, slotConductanceWPerK());
        net.link(c, r, gapConductance(cc, t[c], t[r]));
        net.toAmbient(w, hEnd * endWindingAreaM2());
        net.toAmbient(c, hEnd * coreEndAreaM2(rb, ri) + Convection.endSpaceH(0) * 2 * Math.PI * ri * stackLengthM);
        double shellR = housingOuterDiameterM / 2;
        double film = (t[r] + amb) / 2;
        double hShell = Convection.combined(Convection.combined(
                        Convection.rotatingCylinderH(housingOuterDiameterM, cc.omegaRadS(), film),
                        Convection.flatPlateForcedH(housingLengthM, cc.externalAirSpeedMs(), film)),
                Convection.naturalHorizontalCylinderH(housingOuterDiameterM, t[r], amb))
                + Convection.radiationH(emissivity, t[r], amb);
        double hFace = Convection.combined(Convection.rotatingDiscH(shellR, cc.omegaRadS(), film),
                Convection.naturalVerticalPlateH(housingOuterDiameterM, t[r], amb))
                + Convection.radiationH(emissivity, t[r], amb);
        net.toAmbient(r, hShell * Math.PI * housingOuterDiameterM * housingLengthM + hFace * Math.PI * shellR * shellR);
        return net;
    }

    private double gapConductance(CoolingConditions cc, double coreC, double rotorC) {
        double meanRadius = side == RotorSide.INNER ? gapDiameterM / 2 - airGapM / 2 : gapDiameterM / 2 + airGapM / 2;
        double hGap = Convection.airGapH(airGapM, meanRadius, cc.omegaRadS(), (coreC + rotorC) / 2);
        return hGap * 2 * Math.PI * meanRadius * stackLengthM;
    }

    private double housingToAmbient(CoolingConditions cc, double housingC) {
        double amb = cc.ambientC();
        double film = (housingC + amb) / 2;
        double rad = Convection.radiationH(emissivity, housingC, amb);
        double hSide = Convection.combined(Convection.flatPlateForcedH(housingLengthM, cc.externalAirSpeedMs(), film),
                Convection.naturalHorizontalCylinderH(housingOuterDiameterM, housingC, amb)) + rad;
        double hEnds = Convection.naturalVerticalPlateH(housingOuterDiameterM, housingC, amb) + rad;
        double rh = housingOuterDiameterM / 2;
        return hSide * Math.PI * housingOuterDiameterM * housingLengthM + hEnds * 2 * Math.PI * rh * rh;
    }
}
