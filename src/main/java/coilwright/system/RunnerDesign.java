package coilwright.system;

import coilwright.turbine.CrossflowRunner;
import coilwright.turbine.HydroRunner;
import coilwright.turbine.ImpulseRunner;
import coilwright.turbine.TurgoRunner;
import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;

import java.util.Locale;

/**
 * A hydro runner before it meets its site: its kind, jets and either its diameter or the optimum speed it is
 * to be sized for. Nozzle coefficient and speed ratio are the defaults of the {@code turbine} models
 * (Cv 0.98; bucket-to-jet speed ratio 0.46 impulse, 0.47 Turgo; crossflow N = 40 sqrt(H) / D).
 *
 * @param kind            IMPULSE, TURGO or CROSSFLOW
 * @param jetCount        jets (nozzles), 1 to 6 impulse, 1 to 3 Turgo, 1 crossflow
 * @param diameterM       pitch-circle (impulse, Turgo) or outer (crossflow) diameter, m, 0 to 5 (2 crossflow);
 *                        0 = solve it for {@code targetSpeedRpm}
 * @param targetSpeedRpm  wanted optimum runner speed when the diameter is solved, rpm, 0 to 6000 (3000
 *                        crossflow); must be > 0 when diameterM is 0
 * @param peakEfficiency  runner efficiency at its optimum, 0 to 0.95 (0.9 crossflow); 0 = the kind's default
 */
public record RunnerDesign(RunnerKind kind, int jetCount, double diameterM, double targetSpeedRpm,
                           double peakEfficiency) {
    public RunnerDesign {
        Checks c = new Checks().present("kind", kind);
        c.throwIfAny();
        c.intRange("jetCount", jetCount, 1, kind.maxJets());
        c.range("diameterM", diameterM, 0.0, kind.maxDiameterM());
        c.range("targetSpeedRpm", targetSpeedRpm, 0.0, kind.maxTargetSpeedRpm());
        c.range("peakEfficiency", peakEfficiency, 0.0, kind.maxPeakEfficiency());
        if (!c.hasErrors()) {
            c.require(diameterM > 0 || targetSpeedRpm > 0, "targetSpeedRpm", targetSpeedRpm,
                    "must be > 0 when diameterM is 0 (give the diameter or the speed to size it for)", "> 0");
        }
        c.throwIfAny();
    }

    /** The peak efficiency in use. */
    public double effectivePeakEfficiency() {
        return peakEfficiency > 0 ? peakEfficiency : kind.defaultPeakEfficiency();
    }

    /**
     * The runner working at a net head and flow, its diameter given or solved.
     *
     * @param netHeadM  net head, m, > 0 and <= the kind's limit
     * @param flowM3s   flow, m^3/s, > 0 and <= 10
     * @throws InfeasibleDesignException when the solved diameter falls outside the model's range
     */
    public HydroRunner at(double netHeadM, double flowM3s) {
        try {
            return build(netHeadM, flowM3s);
        } catch (InvalidInputException e) {
            if (diameterM > 0) {
                throw e;
            }
            throw new InfeasibleDesignException("runner.targetSpeedRpm", String.format(Locale.ROOT,
                    "No %s runner fits a target speed of %.0f rpm at %.1f m net head: %s", kind.name().toLowerCase(Locale.ROOT),
                    targetSpeedRpm, netHeadM, e.getMessage()));
        }
    }

    private HydroRunner build(double netHeadM, double flowM3s) {
        double eta = effectivePeakEfficiency();
        double cv = ImpulseRunner.DEFAULT_NOZZLE_VELOCITY_COEFFICIENT;
        return switch (kind) {
            case IMPULSE -> diameterM > 0
                    ? new ImpulseRunner(netHeadM, flowM3s, jetCount, diameterM, cv, ImpulseRunner.DEFAULT_SPEED_RATIO, eta)
                    : ImpulseRunner.forTargetSpeed(netHeadM, flowM3s, jetCount, targetSpeedRpm, cv,
                    ImpulseRunner.DEFAULT_SPEED_RATIO, eta);
            case TURGO -> {
                double d = diameterM > 0 ? diameterM
                        : TurgoRunner.forTargetSpeed(netHeadM, flowM3s, jetCount, targetSpeedRpm).pitchCircleDiameterM();
                yield new TurgoRunner(netHeadM, flowM3s, jetCount, d, cv, TurgoRunner.DEFAULT_SPEED_RATIO, eta);
            }
            case CROSSFLOW -> diameterM > 0 ? new CrossflowRunner(netHeadM, flowM3s, diameterM, eta)
                    : CrossflowRunner.forTargetSpeed(netHeadM, flowM3s, targetSpeedRpm, eta);
        };
    }
}
