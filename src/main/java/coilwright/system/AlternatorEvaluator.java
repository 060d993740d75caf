package coilwright.system;

import coilwright.conductor.CurrentDensity;
import coilwright.load.AcSource;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Chemistry;
import coilwright.load.ConductionMode;
import coilwright.load.CutIn;
import coilwright.load.Load;
import coilwright.load.LoadSolver;
import coilwright.load.OperatingPoint;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.magnet.MagnetGrade;
import coilwright.magnet.MagnetMaterial;
import coilwright.safety.Cautions;
import coilwright.safety.SafetyInputs;
import coilwright.validation.SolverFailedException;

import coilwright.validation.TimeBudget;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Evaluates an alternator with its load over a speed range: the operating curve, cut-in, rated point and cautions. */
public final class AlternatorEvaluator {

    /** Bisection steps for the solved cut-in: 2^-50 of the bracket is far below any meaningful speed. */
    private static final int CUT_IN_BISECTION_STEPS = 50;
    /**
     * Relative half-width of the bracket around the closed-form cut-in: the solver conducts from
     * 1 / cos(MIN_WINDOW_RAD) = 1 + 5e-7 times it, well inside.
     */
    private static final double CUT_IN_BRACKET = 1e-3;
    /** Enough halvings of that bracket to reach adjacent doubles. */
    private static final int MAX_ZERO_TEST_STEPS = 80;

    private AlternatorEvaluator() {
    }

    /**
     * @throws coilwright.validation.InvalidInputException     when an input is out of range
     * @throws coilwright.validation.InfeasibleDesignException when the machine cannot be built
     */
    public static AlternatorEvaluation evaluate(EvaluationRequest req) {
        Alternator alt = AlternatorModel.build(req.alternator());
        return evaluate(alt, req);
    }

    /** Evaluates an already-built alternator (for callers that vary only the load or speeds). */
    public static AlternatorEvaluation evaluate(Alternator alt, EvaluationRequest req) {
        Load load = req.load();
        // one warm-started sweep in speed order; each point agrees with point(...) to the solver's tolerance
        LoadSolver.Sweep sweep = sweep(alt, load);
        List<SpeedPoint> points = new ArrayList<>(req.speedRange().points());
        for (int i = 0; i < req.speedRange().points(); i++) {
            TimeBudget.check("speedRange.points");
            points.add(point(alt, sweep, req.speedRange().speedRpm(i)));
        }
        SpeedPoint rated = point(alt, sweep, req.effectiveRatedSpeedRpm());
        double cutIn = closedFormCutInRpm(alt, load);
        double cutInSolved = load instanceof BatteryLoad ? solvedCutInRpm(alt, load, sweep, cutIn) : 0;
        double pathAreaM2 = req.alternator().wire().conductorCopperAreaM2();
        CurrentDensity density = CurrentDensity.check(rated.phaseCurrentRmsA() / req.alternator().winding().parallelPaths(),
                pathAreaM2, req.alternator().cooling());
        double maxSpeed = req.effectiveMaxSpeedRpm();
        double vocMax = alt.emfLineRmsV(maxSpeed);

        List<String> warnings = new ArrayList<>(alt.warnings());
        if (density.status() == CurrentDensity.Status.ABOVE_BAND) {
            warnings.add(String.format(Locale.ROOT, "Current density at rated speed %.1f A/mm^2 is above the %.0f-%.0f A/mm^2 "
                            + "band for %s cooling: the winding will run hotter than %.0f C", density.densityAPerMm2(),
                    density.bandLowAPerMm2(), density.bandHighAPerMm2(), density.cooling(), req.alternator().windingTempC()));
        }
        if (load instanceof BatteryLoad && cutIn > req.speedRange().maxRpm()) {
            warnings.add(String.format(Locale.ROOT, "Cut-in speed %.0f rpm is above the evaluated range: the battery never charges", cutIn));
        }
        double maxOutput = points.stream().mapToDouble(SpeedPoint::powerToLoadW).max().orElse(0);
        double maxDc = points.stream().mapToDouble(SpeedPoint::dcCurrentA).max().orElse(0);
        SafetyInputs safety = safetyInputs(alt, load, vocMax, maxSpeed, req.maxSpeedRpm() > 0
                        ? "the maximum speed given" : "twice the rated speed, as no maximum was given",
                Math.max(maxOutput, rated.powerToLoadW()), Math.max(maxDc, rated.dcCurrentA()));
        HeatAndLosses heat = HeatAssessment.assess(alt, load, points, rated, maxSpeed);
        List<coilwright.safety.Caution> cautions = new ArrayList<>(Cautions.assess(safety));
        cautions.addAll(HeatAssessment.cautions(alt, heat));
        cautions.sort(java.util.Comparator.comparing(coilwright.safety.Caution::severity));
        return new AlternatorEvaluation(alt, cutIn, cutInSolved, points, rated, density, vocMax, maxSpeed,
                cautions, warnings, heat);
    }

    /** One operating point at a shaft speed. */
    public static SpeedPoint point(Alternator alt, Load load, double speedRpm) {
        double f = alt.frequencyHz(speedRpm);
        double ePh = alt.emfPhaseRmsV(speedRpm);
        double eLine = alt.emfLineRmsV(speedRpm);
        if (speedRpm <= 0) {
            return SpeedPoint.standstill();
        }
        AcSource src = new AcSource(alt.spec().winding().phases(), alt.spec().connection(), ePh, f,
                alt.phaseResistanceHotOhm(), alt.phaseInductanceH());
        return speedPoint(alt, speedRpm, f, ePh, eLine, atSpeed(speedRpm, () -> LoadSolver.solve(src, load)));
    }

    /** Runs one operating-point solve, naming the shaft speed in a solver failure. */
    private static OperatingPoint atSpeed(double speedRpm, java.util.function.Supplier<OperatingPoint> solve) {
        try {
            return solve.get();
        } catch (SolverFailedException e) {
            throw new SolverFailedException(e.field(), String.format(Locale.ROOT, "At %.6g rpm: %s", speedRpm,
                    e.getMessage()), e.getCause());
        }
    }

    /** A warm-started sweep over speeds for this alternator and load (one per thread). */
    static LoadSolver.Sweep sweep(Alternator alt, Load load) {
        // the reference source only carries the speed-independent constants
        AcSource reference = new AcSource(alt.spec().winding().phases(), alt.spec().connection(), 0, 1,
                alt.phaseResistanceHotOhm(), alt.phaseInductanceH());
        return LoadSolver.sweep(reference, load);
    }

    /**
     * {@link #point(Alternator, Load, double)} solved on a sweep: the same operating point to the solver's
     * tolerance, started from the sweep's previous solutions. Evaluation and matching both use it.
     */
    static SpeedPoint point(Alternator alt, LoadSolver.Sweep sweep, double speedRpm) {
        double f = alt.frequencyHz(speedRpm);
        double ePh = alt.emfPhaseRmsV(speedRpm);
        double eLine = alt.emfLineRmsV(speedRpm);
        if (speedRpm <= 0) {
            return SpeedPoint.standstill();
        }
        return speedPoint(alt, speedRpm, f, ePh, eLine, atSpeed(speedRpm, () -> sweep.solveAt(ePh, f)));
    }

    private static SpeedPoint speedPoint(Alternator alt, double speedRpm, double f, double ePh, double eLine,
                                         OperatingPoint op) {
        double omega = speedRpm * 2 * Math.PI / 60;
        double shaftW = op.powerFromEmfW();
        double pathCurrent = op.phaseCurrentRmsA() / alt.spec().winding().parallelPaths();
        double density = pathCurrent / (alt.spec().wire().conductorCopperAreaM2() * 1e6);
        return new SpeedPoint(speedRpm, f, ePh, eLine, op.lineToLineTerminalVoltageRmsV(), op.dcVoltageAtRectifierV(),
                op.dcCurrentA(), op.phaseCurrentRmsA(), op.lineCurrentRmsA(), op.powerToLoadW(), op.windingCopperLossW(),
                op.acCableLossW() + op.dcCableLossW(), op.batteryInternalLossW(), op.diodeLossW(), shaftW, shaftW / omega,
                op.efficiencyFromEmf(), density, op.mode());
    }

    /** Closed-form cut-in speed for a battery load, rpm; 0 for a resistive load. */
    public static double closedFormCutInRpm(Alternator alt, Load load) {
        if (!(load instanceof BatteryLoad b)) {
            return 0;
        }
        BridgeType type = b.rectifier().type();
        // the bridge sees the line-to-line EMF of a three-phase machine, the winding EMF of a single-phase one
        double ke = type == BridgeType.THREE_PHASE_BRIDGE ? alt.keLineRmsVPerRpm() : alt.kePhaseRmsVPerRpm();
        return CutIn.speedRpm(ke, b.battery().voltageV(), b.rectifier().forwardDropV(), type);
    }

    /**
     * The lowest speed at which the solved operating point carries current, rpm. The solver's zero test is closed
     * form, so the bracket around the closed-form cut-in is bisected on it down to adjacent doubles; the answer is
     * then confirmed by full solves on both sides (current above, none below), and the plain bisection on full
     * solves is used whenever that confirmation fails.
     */
    static double solvedCutInRpm(Alternator alt, Load load, LoadSolver.Sweep sweep, double guessRpm) {
        double lo = (1 - CUT_IN_BRACKET) * guessRpm;
        double hi = (1 + CUT_IN_BRACKET) * guessRpm;
        if (lo > 0 && !conducts(alt, sweep, lo) && conducts(alt, sweep, hi)) {
            for (int k = 0; k < MAX_ZERO_TEST_STEPS; k++) {
                double mid = 0.5 * (lo + hi);
                if (mid <= lo || mid >= hi) {
                    break;
                }
                if (conducts(alt, sweep, mid)) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            if (point(alt, sweep, hi).dcCurrentA() > 0 && point(alt, sweep, lo).dcCurrentA() <= 0) {
                return hi;
            }
        }
        return solvedCutInRpm(alt, load, guessRpm);
    }

    private static boolean conducts(Alternator alt, LoadSolver.Sweep sweep, double speedRpm) {
        return sweep.conductsAt(alt.emfPhaseRmsV(speedRpm), alt.frequencyHz(speedRpm));
    }

    /** The lowest speed at which the solved operating point carries current, found by bisection, rpm. */
    static double solvedCutInRpm(Alternator alt, Load load, double guessRpm) {
        double lo = 0.5 * guessRpm;
        double hi = 1.5 * guessRpm;
        for (int k = 0; k < 20 && point(alt, load, hi).dcCurrentA() <= 0; k++) {
            hi *= 2;
        }
        for (int k = 0; k < 20 && lo > 0 && point(alt, load, lo).dcCurrentA() > 0; k++) {
            lo /= 2;
        }
        for (int k = 0; k < CUT_IN_BISECTION_STEPS; k++) {
            double mid = 0.5 * (lo + hi);
            if (point(alt, load, mid).dcCurrentA() > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return hi;
    }

    /**
     * The safety cautions of an alternator and load with the open-circuit voltage checked at a given speed, such as
     * a turbine's runaway or free-spinning speed.
     *
     * @param checkSpeedRpm     alternator speed for the open-circuit voltage check, rpm, >= 0
     * @param checkSpeedSource  where that speed comes from, in words
     * @param maxOutputW        largest output power, W, >= 0 (diversion-load sizing)
     * @param maxDcA            largest DC current, A, >= 0 (fusing)
     * @return the cautions, most serious first
     */
    public static List<coilwright.safety.Caution> cautionsAt(Alternator alt, Load load, double checkSpeedRpm,
                                                             String checkSpeedSource, double maxOutputW, double maxDcA) {
        return Cautions.assess(safetyInputs(alt, load, alt.emfLineRmsV(checkSpeedRpm), checkSpeedRpm,
                checkSpeedSource, maxOutputW, maxDcA));
    }

    private static SafetyInputs safetyInputs(Alternator alt, Load load, double vocMax, double maxSpeed, String source,
                                             double maxOutputW, double maxDcA) {
        boolean battery = load instanceof BatteryLoad;
        BatteryLoad b = battery ? (BatteryLoad) load : null;
        MagnetGrade grade = alt.spec().rotor().grade();
        return new SafetyInputs(vocMax, maxSpeed, source,
                battery, battery ? b.battery().voltageV() : 0,
                battery && b.battery().chemistry() == Chemistry.LEAD_ACID, maxOutputW, maxDcA, alt.magnetMassKg(),
                grade.material() == MagnetMaterial.NDFEB_SINTERED, alt.spec().connection() == coilwright.machine.Connection.DELTA,
                Math.min(1, alt.thirdHarmonicEmfRatio()), alt.spec().magnetTempC() > grade.maxWorkingTempC(),
                alt.windingOverTemperature());
    }
}
