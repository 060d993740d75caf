package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A crossflow (Banki-Michell) runner. Optimum speed by the usual rule N = 40 sqrt(H) / D (rpm, H in m,
 * D in m; common practice, the SI form of Mockmore &amp; Merryfield's 1949 result N = 862 sqrt(H)/D in
 * feet and inches, from memory). It puts the rim speed near half the jet speed.
 *
 * @param netHeadM        net head, m, > 0 and <= 200
 * @param flowM3s         flow, m^3/s, > 0 and <= 10
 * @param runnerDiameterM outer runner diameter, m, > 0 and <= 2
 * @param peakEfficiency  efficiency at the optimum, > 0 and <= 0.9 (about 0.7 for small runners; common practice)
 */
public record CrossflowRunner(double netHeadM, double flowM3s, double runnerDiameterM, double peakEfficiency)
        implements HydroRunner {
    /** The constant of N = 40 sqrt(H) / D, rpm m^0.5. */
    public static final double SPEED_CONSTANT = 40.0;
    public static final double DEFAULT_PEAK_EFFICIENCY = 0.70;

    public CrossflowRunner {
        new Checks().rangeExclusiveMin("netHeadM", netHeadM, 0.0, 200.0)
                .rangeExclusiveMin("flowM3s", flowM3s, 0.0, 10.0)
                .rangeExclusiveMin("runnerDiameterM", runnerDiameterM, 0.0, 2.0)
                .rangeExclusiveMin("peakEfficiency", peakEfficiency, 0.0, 0.9).throwIfAny();
    }

    /** A crossflow runner with peak efficiency 0.70. */
    public static CrossflowRunner crossflow(double netHeadM, double flowM3s, double runnerDiameterM) {
        return new CrossflowRunner(netHeadM, flowM3s, runnerDiameterM, DEFAULT_PEAK_EFFICIENCY);
    }

    /**
     * A crossflow runner sized for a target optimum speed: D = 40 sqrt(H) / N.
     *
     * @param targetSpeedRpm wanted optimum speed, rpm, > 0 and <= 3000
     */
    public static CrossflowRunner forTargetSpeed(double netHeadM, double flowM3s, double targetSpeedRpm,
                                                 double peakEfficiency) {
        new Checks().rangeExclusiveMin("targetSpeedRpm", targetSpeedRpm, 0.0, 3000.0)
                .rangeExclusiveMin("netHeadM", netHeadM, 0.0, 200.0).throwIfAny();
        return new CrossflowRunner(netHeadM, flowM3s, SPEED_CONSTANT * Math.sqrt(netHeadM) / targetSpeedRpm,
                peakEfficiency);
    }

    @Override
    public double optimumSpeedRpm() {
        return SPEED_CONSTANT * Math.sqrt(netHeadM) / runnerDiameterM;
    }
}
