package coilwright.system;

import coilwright.load.Load;
import coilwright.load.LoadSolver;
import coilwright.machine.Alternator;
import coilwright.validation.Checks;

import coilwright.validation.TimeBudget;
import java.util.HashMap;
import java.util.Map;

/**
 * An alternator with its load seen as a torque-speed curve at its shaft, for matching to a turbine. Each
 * operating point is solved on one warm-started sweep, the same path as an evaluation's curve (each point starts
 * from the previous solutions; the answer is the cold solve's to the solver's tolerance), and kept, so a speed
 * asked twice is solved once. Not thread-safe: one instance per matching run.
 */
public final class AlternatorCurve {
    private final Alternator alternator;
    private final Load load;
    private final Map<Double, SpeedPoint> solved = new HashMap<>();
    private final LoadSolver.Sweep sweep;

    /**
     * @param alternator the built machine
     * @param load       its battery or resistive load
     */
    public AlternatorCurve(Alternator alternator, Load load) {
        new Checks().present("alternator", alternator).present("load", load).throwIfAny();
        this.alternator = alternator;
        this.load = load;
        this.sweep = AlternatorEvaluator.sweep(alternator, load);
    }

    /**
     * The operating point at an alternator shaft speed.
     *
     * @param speedRpm alternator speed, rpm, >= 0
     */
    public SpeedPoint at(double speedRpm) {
        new Checks().nonNegative("speedRpm", speedRpm).throwIfAny();
        return solved.computeIfAbsent(speedRpm, n -> {
            TimeBudget.check("");
            return AlternatorEvaluator.point(alternator, sweep, n);
        });
    }

    /**
     * Torque the alternator needs at its shaft, N m (0 below cut-in, where no current flows).
     *
     * @param speedRpm alternator speed, rpm, >= 0
     */
    public double torqueNm(double speedRpm) {
        return at(speedRpm).shaftTorqueNm();
    }

    /** Open-circuit line EMF at a speed, V rms. */
    public double openCircuitLineRmsV(double speedRpm) {
        return alternator.emfLineRmsV(speedRpm);
    }

    public Alternator alternator() {
        return alternator;
    }

    public Load load() {
        return load;
    }
}
