package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A Turgo-type impulse runner: the jet enters one face of the runner at an angle and leaves the other,
 * so it takes more flow for its diameter than a Pelton. Same jet arithmetic as {@link ImpulseRunner}.
 *
 * @param netHeadM                  net head, m, > 0 and <= 1000
 * @param flowM3s                   total flow, m^3/s, > 0 and <= 10
 * @param jetCount                  number of jets, 1 to 3
 * @param pitchCircleDiameterM      runner pitch-circle diameter, m, > 0 and <= 5
 * @param nozzleVelocityCoefficient Cv, 0.90 to 1.0
 * @param speedRatio                runner speed / jet speed at the optimum, 0.40 to 0.55 (0.45 to 0.5; common practice)
 * @param peakEfficiency            efficiency at the optimum, > 0 and <= 0.95 (about 0.75 small runners; common practice)
 */
public record TurgoRunner(double netHeadM, double flowM3s, int jetCount, double pitchCircleDiameterM,
                          double nozzleVelocityCoefficient, double speedRatio, double peakEfficiency)
        implements HydroRunner {
    public static final double DEFAULT_SPEED_RATIO = 0.47;
    public static final double DEFAULT_PEAK_EFFICIENCY = 0.75;

    public TurgoRunner {
        Checks c = new Checks();
        c.rangeExclusiveMin("netHeadM", netHeadM, 0.0, 1000.0);
        c.rangeExclusiveMin("flowM3s", flowM3s, 0.0, 10.0);
        c.intRange("jetCount", jetCount, 1, 3);
        c.rangeExclusiveMin("pitchCircleDiameterM", pitchCircleDiameterM, 0.0, 5.0);
        c.range("nozzleVelocityCoefficient", nozzleVelocityCoefficient, 0.90, 1.0);
        c.range("speedRatio", speedRatio, 0.40, 0.55);
        c.rangeExclusiveMin("peakEfficiency", peakEfficiency, 0.0, 0.95);
        c.throwIfAny();
    }

    /** A Turgo runner with Cv 0.98, speed ratio 0.47 and peak efficiency 0.75. */
    public static TurgoRunner turgo(double netHeadM, double flowM3s, int jetCount, double pitchCircleDiameterM) {
        return new TurgoRunner(netHeadM, flowM3s, jetCount, pitchCircleDiameterM,
                ImpulseRunner.DEFAULT_NOZZLE_VELOCITY_COEFFICIENT, DEFAULT_SPEED_RATIO, DEFAULT_PEAK_EFFICIENCY);
    }

    /**
     * A Turgo runner (default coefficients) sized so that its optimum speed is the target.
     *
     * @param targetSpeedRpm wanted optimum speed, rpm, > 0 and <= 6000
     */
    public static TurgoRunner forTargetSpeed(double netHeadM, double flowM3s, int jetCount, double targetSpeedRpm) {
        return forTargetSpeed(netHeadM, flowM3s, jetCount, targetSpeedRpm,
                ImpulseRunner.DEFAULT_NOZZLE_VELOCITY_COEFFICIENT, DEFAULT_SPEED_RATIO, DEFAULT_PEAK_EFFICIENCY);
    }

    /**
     * A Turgo runner sized so that its optimum speed is the target, with the user's nozzle velocity coefficient and
     * runner-to-jet speed ratio: D = 60 x ratio x Cv sqrt(2gH) / (pi n).
     *
     * @param targetSpeedRpm wanted optimum speed, rpm, > 0 and <= 6000
     */
    public static TurgoRunner forTargetSpeed(double netHeadM, double flowM3s, int jetCount, double targetSpeedRpm,
                                             double nozzleVelocityCoefficient, double speedRatio,
                                             double peakEfficiency) {
        new Checks().rangeExclusiveMin("targetSpeedRpm", targetSpeedRpm, 0.0, 6000.0)
                .rangeExclusiveMin("netHeadM", netHeadM, 0.0, 1000.0)
                .range("nozzleVelocityCoefficient", nozzleVelocityCoefficient, 0.90, 1.0)
                .range("speedRatio", speedRatio, 0.40, 0.55).throwIfAny();
        double runnerSpeed = speedRatio * Jets.jetVelocityMs(nozzleVelocityCoefficient, netHeadM);
        return new TurgoRunner(netHeadM, flowM3s, jetCount, Jets.diameterM(runnerSpeed, targetSpeedRpm),
                nozzleVelocityCoefficient, speedRatio, peakEfficiency);
    }

    /** Jet diameter for the flow per jet, m (the same as {@link #nozzleDiameterM()}). */
    public double jetDiameterM() {
        return nozzleDiameterM();
    }

    /** Jet velocity Cv sqrt(2 g H), m/s. */
    public double jetVelocityMs() {
        return Jets.jetVelocityMs(nozzleVelocityCoefficient, netHeadM);
    }

    /** Jet diameter for the flow per jet, m. */
    public double nozzleDiameterM() {
        return Jets.jetDiameterM(flowM3s / jetCount, jetVelocityMs());
    }

    @Override
    public double optimumSpeedRpm() {
        return Jets.speedRpm(speedRatio * jetVelocityMs(), pitchCircleDiameterM);
    }
}
