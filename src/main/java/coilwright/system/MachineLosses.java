package coilwright.system;

import coilwright.conductor.Copper;
import coilwright.conductor.Cooling;
import coilwright.load.Load;
import coilwright.load.LoadSolver;
import coilwright.losses.Bearing;
import coilwright.losses.BearingType;
import coilwright.losses.ConductorEddyLoss;
import coilwright.losses.CoreFlux;
import coilwright.losses.DeltaCirculation;
import coilwright.losses.ElectricalSteels;
import coilwright.losses.IronLoss;
import coilwright.losses.ShaftFriction;
import coilwright.losses.StatorCore;
import coilwright.losses.Windage;
import coilwright.losses.ZeroSequenceInductance;
import coilwright.machine.AirCoredStator;
import coilwright.machine.Alternator;
import coilwright.machine.SlottedStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.thermal.Air;
import coilwright.thermal.CoolingConditions;
import coilwright.thermal.CoupledTemperature;
import coilwright.thermal.DiscStatorThermal;
import coilwright.thermal.Enclosure;
import coilwright.thermal.HeatSources;
import coilwright.thermal.SlottedStatorThermal;
import coilwright.thermal.ThermalModel;
import coilwright.thermal.WindingTemperature;

import java.util.List;

/**
 * Every loss of an alternator and its load at a shaft speed and a winding temperature, and the winding temperature
 * its losses heat it to. The pieces are the core models: the rectifier operating point re-solved with the copper
 * resistance at the winding temperature (IEC 60028), conductor eddy loss of air-cored coils, stator iron loss,
 * delta circulating current, bearing friction and windage (package {@code coilwright.losses}), and the thermal
 * network of the cooling arrangement (package {@code coilwright.thermal}). What the design does not state is
 * assumed and listed in {@link #assumptions()}. Not thread-safe: its rectifier points are warm-started one from
 * the next, so one instance serves one thread.
 */
public final class MachineLosses {
    /** Bearings assumed when none are given: two sealed deep-groove ball bearings of this bore, m (common practice
     *  for small wind and hydro alternator shafts). */
    static final double ASSUMED_BEARING_BORE_M = 0.025;
    /** Equivalent load on each assumed bearing, N (a few tens of kilograms of rotor and magnetic pull; assumed). */
    static final double ASSUMED_BEARING_LOAD_N = 250;
    /** Contact-seal and grease drag of each assumed bearing, N m (from memory, see {@link Bearing}). */
    static final double ASSUMED_SEAL_DRAG_NM = 0.03;
    /** Yoke flux density the stator back iron is assumed sized for when its depth is not given, T (common practice). */
    static final double ASSUMED_YOKE_FLUX_DENSITY_T = 1.4;
    private static final double EDDY_REFERENCE_C = 20.0;
    /** Speed the conductor eddy loss is integrated at before scaling with the speed squared, rpm (any would do). */
    private static final double EDDY_SCALING_RPM = 1000;
    /** Highest speed of {@link CoolingConditions}, rpm. */
    private static final double MAX_THERMAL_RPM = 20_000;

    private final Alternator alt;
    private final Load load;
    private final ThermalModel thermal;
    private final ShaftFriction friction;
    private final StatorCore core;
    private final CoreFlux coreFlux;
    private final double ambientC;
    private final List<String> assumptions;
    /** The rectifier points of every speed and temperature, each warm-started from the last (so: one thread). */
    private final LoadSolver.Sweep sweep;
    /** Zero-sequence inductance of the winding (geometry only, for the delta circulating current). */
    private final ZeroSequenceInductance zeroSequence;
    /**
     * Conductor eddy loss of air-cored coils at {@link #EDDY_REFERENCE_C} over the speed squared, W/rpm^2 (0 for a
     * slotted stator): the loss is the field's mean square over the coil layer, a property of the geometry alone,
     * times omega^2 ({@link ConductorEddyLoss#airCored}), so it is integrated once here and scaled at each speed.
     */
    private final double eddyPerRpmSquaredW;

    /**
     * @param alt      the built machine
     * @param load     its battery or resistive load
     * @param ambientC ambient air temperature, C, -40 to 60
     */
    public MachineLosses(Alternator alt, Load load, double ambientC) {
        this.alt = alt;
        this.load = load;
        this.ambientC = ambientC;
        this.friction = assumedFriction();
        this.sweep = AlternatorEvaluator.sweep(alt, load);
        this.zeroSequence = ZeroSequenceInductance.forWinding(alt.winding(),
                alt.spec().rotor() instanceof AxialDualRotor);
        if (alt.spec().rotor() instanceof AxialDualRotor r) {
            this.eddyPerRpmSquaredW = ConductorEddyLoss.airCored(r, alt.spec().winding().poles(),
                    alt.spec().magnetTempC(), alt.spec().winding().slots(), alt.spec().turnsPerCoil(),
                    alt.spec().wire().strandsInHand(), alt.spec().wire().bareDiameterM(), EDDY_SCALING_RPM,
                    EDDY_REFERENCE_C).totalW() / (EDDY_SCALING_RPM * EDDY_SCALING_RPM);
        } else {
            this.eddyPerRpmSquaredW = 0;
        }
        String bearings = "bearings: two sealed deep-groove ball bearings, " + fmt(ASSUMED_BEARING_BORE_M * 1000)
                + " mm bore, " + fmt(ASSUMED_BEARING_LOAD_N) + " N each, seal drag " + fmt(ASSUMED_SEAL_DRAG_NM)
                + " N m each (assumed)";
        String air = "still air at " + fmt(ambientC) + " C around the machine";
        if (alt.spec().rotor() instanceof RadialSurfaceRotor r && alt.spec().stator() instanceof SlottedStator s) {
            double yoke = alt.gapField().fluxPerPoleWb() / (2 * StatorCore.DEFAULT_STACKING_FACTOR
                    * ASSUMED_YOKE_FLUX_DENSITY_T * r.stackLengthM());
            this.core = StatorCore.of(ElectricalSteels.UNKNOWN_MOTOR_LAMINATION, clamp(yoke, 0.001, 0.5));
            this.coreFlux = CoreFlux.of(r, s, core, alt.spec().winding().slots(), alt.gapField());
            Enclosure enclosure = alt.spec().cooling() == Cooling.ENCLOSED_NATURAL ? Enclosure.ENCLOSED
                    : Enclosure.OPEN_VENTILATED;
            this.thermal = SlottedStatorThermal.of(r, s, alt.spec().winding().slots(), alt.meanTurnLengthM(),
                    core.yokeThicknessM(), enclosure, clamp(alt.fill().copperFill(), 0.05, 0.8));
            String housing = enclosure.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
            this.assumptions = List.of("slotted stator in a housing, " + housing
                            + (enclosure == Enclosure.OPEN_VENTILATED && alt.spec().cooling() != Cooling.OPEN_VENTILATED
                            ? " (no fan or liquid cooling is modelled: errs hot)" : ""),
                    "laminations: " + ElectricalSteels.UNKNOWN_MOTOR_LAMINATION + " (conservative), build factor "
                            + fmt(core.buildFactor()) + ", back iron " + fmt(core.yokeThicknessM() * 1000)
                            + " mm deep (sized for " + fmt(ASSUMED_YOKE_FLUX_DENSITY_T) + " T, assumed)",
                    bearings, air);
        } else {
            AxialDualRotor r = (AxialDualRotor) alt.spec().rotor();
            DiscStatorThermal first = DiscStatorThermal.of(r, (AirCoredStator) alt.spec().stator(), 0.5);
            double ring = Math.PI * (sq(first.coilRingOuterRadiusM()) - sq(first.coilRingInnerRadiusM()))
                    * first.coilLayerThicknessM();
            double fill = clamp(alt.copperMassKg() / Copper.DENSITY_KG_PER_M3 / ring, 0.05, 0.8);
            this.thermal = DiscStatorThermal.of(r, (AirCoredStator) alt.spec().stator(), fill);
            this.core = null;
            this.coreFlux = null;
            this.assumptions = List.of("air-cored coils cast in unfilled resin between the rotor discs, copper "
                    + fmt(100 * fill) + " % of the coil ring", bearings, air);
        }
    }

    /** Friction of the assumed bearings (see {@link #ASSUMED_BEARING_BORE_M}). */
    public static ShaftFriction assumedFriction() {
        return ShaftFriction.ofBearings(List.of(assumedBearing(), assumedBearing()));
    }

    private static Bearing assumedBearing() {
        return new Bearing(BearingType.DEEP_GROOVE_BALL, ASSUMED_BEARING_BORE_M, ASSUMED_BEARING_LOAD_N,
                ASSUMED_SEAL_DRAG_NM);
    }

    /**
     * Highest speed the models here are used at, rpm: the thermal networks' 20 000 rpm and the iron-loss separation's
     * {@link IronLoss#MAX_FREQUENCY_HZ}.
     */
    public static double maxSpeedRpm(Alternator alt) {
        return Math.min(MAX_THERMAL_RPM, IronLoss.MAX_FREQUENCY_HZ * 60 / alt.polePairs());
    }

    /** What was assumed because the design does not state it. */
    public List<String> assumptions() {
        return assumptions;
    }

    /** Shaft friction, running and break-away. */
    public ShaftFriction friction() {
        return friction;
    }

    /** Ambient temperature, C. */
    public double ambientC() {
        return ambientC;
    }

    /**
     * The steady state at a speed: the winding temperature that its own losses heat it to, and every loss there.
     *
     * @param speedRpm shaft speed, rpm, &gt;= 0
     * @throws coilwright.validation.SolverFailedException when the fixed point does not converge
     */
    public LossPoint steadyAt(double speedRpm) {
        return steadyAt(speedRpm, alt.spec().windingTempC());
    }

    /**
     * As {@link #steadyAt(double)}, the fixed point searched from a winding temperature near the answer (such as one
     * interpolated between neighbouring speeds): the same answer to {@link WindingTemperature#ACCURACY_K}, fewer
     * re-solves of the operating point.
     *
     * @param speedRpm shaft speed, rpm, &gt;= 0
     * @param startC   winding temperature to start from, C
     */
    public LossPoint steadyAt(double speedRpm, double startC) {
        if (speedRpm <= 0) {
            return LossPoint.standstill(ambientC);
        }
        return solve(new Fixed(speedRpm), startC);
    }

    /**
     * As {@link #steadyAt(double)} at the speed of a point of the evaluated curve, which was solved with the copper
     * at the temperature entered: that point is the first of the fixed-point search, so the operating point is not
     * solved there again.
     *
     * @param curvePoint a point of {@link AlternatorEvaluator}'s curve for this machine and load
     */
    public LossPoint steadyAt(SpeedPoint curvePoint) {
        if (curvePoint.speedRpm() <= 0) {
            return LossPoint.standstill(ambientC);
        }
        Fixed fixed = new Fixed(curvePoint.speedRpm());
        double enteredC = alt.resistance().workingTemperatureC();
        if (alt.resistance().resistanceOhmAt(enteredC) == alt.phaseResistanceHotOhm()) {
            fixed.remember(enteredC, PowerFlow.of(curvePoint));
        }
        return solve(fixed, enteredC);
    }

    /**
     * The steady state at a speed by the bracketing solve from ambient alone ({@link WindingTemperature#solve}), the
     * reference the faster search of {@link #steadyAt} is checked against.
     */
    LossPoint bracketedAt(double speedRpm) {
        if (speedRpm <= 0) {
            return LossPoint.standstill(ambientC);
        }
        Fixed fixed = new Fixed(speedRpm);
        CoolingConditions cc = new CoolingConditions(speedRpm, ambientC, 0);
        return fixed.point(WindingTemperature.solve(thermal, cc, fixed::heatAt));
    }

    private LossPoint solve(Fixed fixed, double startC) {
        CoolingConditions cc = new CoolingConditions(fixed.speedRpm, ambientC, 0);
        return fixed.point(WindingTemperature.solveNear(thermal, cc, fixed::heatAt, startC));
    }

    /**
     * Running drag at the shaft, N m: bearing friction, windage, stator iron loss, conductor eddy loss and the delta
     * circulating current at a speed with the winding at {@code windingC}, i.e. every loss that the load current does
     * not cause; 0 at standstill (break-away friction and cogging are starting figures, see {@link HeatAssessment}).
     *
     * @param speedRpm shaft speed, rpm, 0 to {@link #maxSpeedRpm(Alternator)}
     * @param windingC winding temperature, C
     */
    public double dragTorqueNm(double speedRpm, double windingC) {
        if (speedRpm <= 0) {
            return 0;
        }
        Fixed f = new Fixed(speedRpm);
        return (f.ironW + f.bearingW + f.windageW + f.eddyW(windingC) + f.deltaW(windingC)) / (speedRpm * Math.PI / 30);
    }

    /** Losses at one speed that do not depend on the winding temperature, and the ones that do. */
    private final class Fixed {
        private final double speedRpm;
        private final double ironW;
        private final double bearingW;
        private final double windageW;
        private final double eddyAtReferenceW;
        /** The operating point last solved (or given) and its winding temperature: the fixed point ends on it. */
        private double flowC = Double.NaN;
        private PowerFlow flow;

        Fixed(double speedRpm) {
            this.speedRpm = speedRpm;
            double omega = speedRpm * Math.PI / 30;
            int poles = alt.spec().winding().poles();
            this.ironW = core == null ? 0 : IronLoss.at(coreFlux, core, poles, speedRpm).totalW();
            this.bearingW = friction.powerW(speedRpm);
            double rho = Air.densityKgM3(ambientC);
            double nu = Air.kinematicViscosityM2s(ambientC);
            if (alt.spec().rotor() instanceof AxialDualRotor r) {
                this.windageW = omega * Windage.axialDualRotorTorqueNm(r, r.outerRadiusM()
                        + DiscStatorThermal.DEFAULT_DISC_OVERHANG_M, speedRpm, rho, nu);
                this.eddyAtReferenceW = eddyPerRpmSquaredW * speedRpm * speedRpm;
            } else {
                this.windageW = omega * Windage.radialRotorTorqueNm((RadialSurfaceRotor) alt.spec().rotor(), speedRpm,
                        rho, nu);
                this.eddyAtReferenceW = 0;
            }
        }

        void remember(double windingC, PowerFlow f) {
            flowC = windingC;
            flow = f;
        }

        /** The rectifier's power flow with the copper at a temperature; the last one is kept. */
        PowerFlow flowAt(double windingC) {
            if (windingC != flowC) {
                remember(windingC, PowerFlow.of(sweep.solveAt(alt.emfPhaseRmsV(speedRpm), alt.frequencyHz(speedRpm),
                        resistanceOhm(windingC) / alt.phaseResistanceHotOhm())));
            }
            return flow;
        }

        double resistanceOhm(double windingC) {
            return alt.resistance().resistanceOhmAt(windingC);
        }

        /** Eddy loss falls as the copper's resistivity rises. */
        double eddyW(double windingC) {
            return eddyAtReferenceW * Copper.resistanceRatio(EDDY_REFERENCE_C) / Copper.resistanceRatio(windingC);
        }

        double deltaW(double windingC) {
            return DeltaCirculation.at(alt.spec().connection(), alt.emfPhaseRmsV(speedRpm),
                    Math.min(1, alt.thirdHarmonicEmfRatio()), resistanceOhm(windingC), alt.phaseInductanceH(),
                    zeroSequence, alt.spec().winding().poles(), speedRpm).copperLossW();
        }

        HeatSources heatAt(double windingC) {
            return new HeatSources(flowAt(windingC).windingCopperLossW() + eddyW(windingC) + deltaW(windingC), ironW,
                    0, bearingW);
        }

        LossPoint point(CoupledTemperature t) {
            double c = t.windingMeanC();
            PowerFlow op = flowAt(c);
            double eddy = eddyW(c);
            double delta = deltaW(c);
            double shaft = op.powerFromEmfW() + eddy + delta + ironW + bearingW + windageW;
            double omega = speedRpm * Math.PI / 30;
            return new LossPoint(speedRpm, c, t.solution().windingHotSpotC(), t.solution().magnetC(), t.settled(),
                    op.powerToLoadW(), op.windingCopperLossW(), eddy, delta, ironW, bearingW, windageW,
                    op.diodeLossW(), op.cableLossW(), op.batteryInternalLossW(), shaft,
                    shaft / omega, shaft > 0 ? op.powerToLoadW() / shaft : 0);
        }
    }

    private static double clamp(double x, double lo, double hi) {
        return Math.max(lo, Math.min(hi, x));
    }

    private static double sq(double x) {
        return x * x;
    }

    /** An assumed figure as a reader sees it: three significant figures. */
    private static String fmt(double x) {
        return String.format(java.util.Locale.ROOT, "%.3g", x);
    }
}
