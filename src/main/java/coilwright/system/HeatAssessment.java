package coilwright.system;

import coilwright.cogging.CoggingCalculator;
import coilwright.cogging.CoggingInput;
import coilwright.cogging.CoggingTorque;
import coilwright.conductor.ThermalClass;
import coilwright.demag.DemagnetisationCheck;
import coilwright.demag.MagnetCircuit;
import coilwright.demag.ShortCircuitCurrent;
import coilwright.load.Load;
import coilwright.machine.Alternator;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.MagnetGrade;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.safety.Caution;
import coilwright.safety.MachineLimitCautions;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Post-processing of an evaluated speed range with the machine models: the steady winding temperature and loss
 * breakdown at speeds across the range and at the rated speed ({@link MachineLosses}), where the insulation class
 * limit is reached (Brent's method between the table's speeds), cogging ({@link CoggingCalculator}), the
 * short-circuit demagnetisation
 * check ({@link DemagnetisationCheck}) and the cautions they call for ({@link MachineLimitCautions}).
 */
public final class HeatAssessment {
    /** Most speeds of the range given the full thermal solution (each is a coupled fixed point). */
    public static final int MAX_POINTS = 21;
    /** Accuracy of the speed at which the insulation limit is reached, rpm. */
    private static final double CROSSING_ACCURACY_RPM = 0.5;
    private static final int CROSSING_MAX_EVALUATIONS = 50;
    /** Highest magnet temperature the demagnetisation check accepts, C. */
    private static final double MAX_MAGNET_CHECK_C = 300;

    private HeatAssessment() {
    }

    /**
     * @param alt         the built machine
     * @param load        its load
     * @param curve       the evaluated curve of this machine and load, ascending in speed (its points, solved with the
     *                    copper at the temperature entered, start each fixed point)
     * @param rated       the curve's point at the rated speed
     * @param maxSpeedRpm the highest speed the machine can reach (short-circuit check), rpm
     * @throws coilwright.validation.SolverFailedException when a winding temperature does not converge
     */
    public static HeatAndLosses assess(Alternator alt, Load load, List<SpeedPoint> curve, SpeedPoint rated,
                                       double maxSpeedRpm) {
        MachineLosses model = new MachineLosses(alt, load, alt.spec().ambientTempC());
        double top = MachineLosses.maxSpeedRpm(alt);
        List<SpeedPoint> inRange = curve.stream().filter(p -> p.speedRpm() <= top).toList();
        List<LossPoint> points = new ArrayList<>();
        int n = inRange.size();
        int stride = Math.max(1, (int) Math.ceil((n - 1) / (double) (MAX_POINTS - 1)));
        for (int i = 0; i < n; i += stride) {
            points.add(model.steadyAt(inRange.get(i)));
        }
        if (n > 0 && (n - 1) % stride != 0) {
            points.add(model.steadyAt(inRange.get(n - 1)));
        }
        double ratedRpm = rated.speedRpm();
        LossPoint ratedLosses = ratedRpm <= top ? model.steadyAt(rated) : model.steadyAt(top);
        LossPoint hottest = points.stream().max(Comparator.comparingDouble(LossPoint::windingHotSpotC))
                .filter(p -> p.windingHotSpotC() > ratedLosses.windingHotSpotC()).orElse(ratedLosses);
        ThermalClass insulation = alt.spec().insulationClass();
        double limit = insulation.limitC();
        double crossing = crossing(model, points, limit);
        CoggingTorque cogging = cogging(alt);
        double magnetC = Math.min(MAX_MAGNET_CHECK_C, Math.max(alt.spec().magnetTempC(), ratedLosses.magnetC()));
        String basis = String.format(Locale.ROOT, "The operating curve uses the winding temperature entered (%.0f C). "
                        + "The loss table solves it instead: at each speed the copper resistance follows the "
                        + "temperature its own losses heat it to, in still air at %.0f C.",
                alt.spec().windingTempC(), model.ambientC())
                + (n < curve.size() || ratedRpm > top ? String.format(Locale.ROOT, " Speeds above %.0f rpm are "
                + "beyond the thermal and iron-loss models and are left out (the rated figures are at %.0f rpm).", top,
                Math.min(ratedRpm, top)) : "");
        return new HeatAndLosses(basis, model.ambientC(), model.assumptions(), points, ratedLosses, hottest, limit,
                crossing > 0, crossing, model.friction(), cogging,
                cogging.peakNm() + model.friction().breakawayTorqueNm(),
                demagnetisation(alt, maxSpeedRpm, magnetC, ratedLosses.windingMeanC()));
    }

    /** Cogging at the magnet temperature entered; none for an air-cored stator. */
    public static CoggingTorque cogging(Alternator alt) {
        return alt.spec().rotor() instanceof RadialSurfaceRotor r
                ? CoggingCalculator.radial(CoggingInput.of(r, alt.spec().winding(), alt.spec().magnetTempC()))
                : CoggingCalculator.airCored();
    }

    /** The cautions the assessment calls for, most serious first. */
    public static List<Caution> cautions(Alternator alt, HeatAndLosses h) {
        List<Caution> out = new ArrayList<>();
        MachineLimitCautions.demagnetisation(h.demagnetisation()).ifPresent(out::add);
        String where = String.format(Locale.ROOT, "at the rated speed of %.0f rpm", h.rated().speedRpm());
        MachineLimitCautions.windingTemperature(Math.min(h.rated().windingHotSpotC(), 1000),
                alt.spec().insulationClass(), where, false).ifPresent(out::add);
        out.sort(Comparator.comparing(Caution::severity));
        return out;
    }

    /** The lowest speed at which the hot spot reaches the limit, rpm; 0 when it does not within the points. */
    private static double crossing(MachineLosses model, List<LossPoint> points, double limitC) {
        for (int i = 0; i < points.size(); i++) {
            if (points.get(i).windingHotSpotC() >= limitC) {
                if (i == 0) {
                    return points.get(0).speedRpm();
                }
                // the table brackets the crossing: Brent's method inside that one interval, each fixed point started
                // from the winding temperature interpolated between the table's
                LossPoint a = points.get(i - 1);
                LossPoint b = points.get(i);
                UnivariateFunction excess = speed -> model.steadyAt(speed, a.windingMeanC() + (speed - a.speedRpm())
                        / (b.speedRpm() - a.speedRpm()) * (b.windingMeanC() - a.windingMeanC())).windingHotSpotC()
                        - limitC;
                return new BrentSolver(CROSSING_ACCURACY_RPM).solve(CROSSING_MAX_EVALUATIONS, excess,
                        points.get(i - 1).speedRpm(), points.get(i).speedRpm());
            }
        }
        return 0;
    }

    /**
     * A sudden short circuit at the highest speed with the magnets at {@code magnetC}; the EMF follows the magnets'
     * remanence from the temperature entered. Ferrite is weakest cold, so the magnet temperature entered is checked
     * too and the worse result kept.
     */
    static DemagnetisationCheck demagnetisation(Alternator alt, double maxSpeedRpm, double magnetC, double windingC) {
        int poles = alt.spec().winding().poles();
        MagnetCircuit circuit = alt.spec().rotor() instanceof AxialDualRotor a ? MagnetCircuit.axial(a, poles)
                : MagnetCircuit.radial((RadialSurfaceRotor) alt.spec().rotor(), alt.spec().winding().slots(), poles);
        double atEntered = alt.spec().magnetTempC();
        return DemagnetisationCheck.worse(check(alt, circuit, maxSpeedRpm, magnetC, windingC),
                check(alt, circuit, maxSpeedRpm, atEntered, windingC));
    }

    private static DemagnetisationCheck check(Alternator alt, MagnetCircuit circuit, double speedRpm, double magnetC,
                                              double windingC) {
        MagnetGrade grade = alt.spec().rotor().grade();
        double emf = alt.emfPhaseRmsV(speedRpm) * grade.remanenceRatio(alt.spec().magnetTempC(), magnetC);
        double x = 2 * Math.PI * alt.frequencyHz(speedRpm) * alt.phaseInductanceH();
        ShortCircuitCurrent sc = ShortCircuitCurrent.of(emf, alt.resistance().resistanceOhmAt(windingC), x);
        return DemagnetisationCheck.of(circuit, magnetC, alt.spec().winding().phases(), alt.spec().winding().poles(),
                alt.seriesTurnsPerPhase(), alt.winding().fundamentalWindingFactor(), sc);
    }
}
