package coilwright.system;

import coilwright.turbine.CrossflowRunner;
import coilwright.turbine.ImpulseRunner;
import coilwright.turbine.TurgoRunner;

/** The kinds of small hydro runner, with the limits and default efficiencies of their models in {@code turbine}. */
public enum RunnerKind {
    /** Pelton-type impulse runner ({@link ImpulseRunner}). */
    IMPULSE(6, 2000.0, 5.0, 6000.0, ImpulseRunner.DEFAULT_PEAK_EFFICIENCY, 0.95),
    /** Turgo-type runner ({@link TurgoRunner}). */
    TURGO(3, 1000.0, 5.0, 6000.0, TurgoRunner.DEFAULT_PEAK_EFFICIENCY, 0.95),
    /** Crossflow (Banki-Michell) runner ({@link CrossflowRunner}); one inlet, jetCount must be 1. */
    CROSSFLOW(1, 200.0, 2.0, 3000.0, CrossflowRunner.DEFAULT_PEAK_EFFICIENCY, 0.9);

    private final int maxJets;
    private final double maxHeadM;
    private final double maxDiameterM;
    private final double maxTargetSpeedRpm;
    private final double defaultPeakEfficiency;
    private final double maxPeakEfficiency;

    RunnerKind(int maxJets, double maxHeadM, double maxDiameterM, double maxTargetSpeedRpm,
               double defaultPeakEfficiency, double maxPeakEfficiency) {
        this.maxJets = maxJets;
        this.maxHeadM = maxHeadM;
        this.maxDiameterM = maxDiameterM;
        this.maxTargetSpeedRpm = maxTargetSpeedRpm;
        this.defaultPeakEfficiency = defaultPeakEfficiency;
        this.maxPeakEfficiency = maxPeakEfficiency;
    }

    /** Most jets (nozzles) the model takes. */
    public int maxJets() {
        return maxJets;
    }

    /** Highest net head the model takes, m. */
    public double maxHeadM() {
        return maxHeadM;
    }

    /** Largest runner diameter the model takes, m. */
    public double maxDiameterM() {
        return maxDiameterM;
    }

    /** Highest target speed when the diameter is solved for, rpm. */
    public double maxTargetSpeedRpm() {
        return maxTargetSpeedRpm;
    }

    /** Peak efficiency used when none is given (common practice for small runners). */
    public double defaultPeakEfficiency() {
        return defaultPeakEfficiency;
    }

    /** Highest peak efficiency accepted. */
    public double maxPeakEfficiency() {
        return maxPeakEfficiency;
    }
}
