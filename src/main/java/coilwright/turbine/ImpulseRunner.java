package coilwright.turbine;

import coilwright.validation.Checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A Pelton (impulse) runner: jet velocity Cv sqrt(2 g H), best bucket speed a fixed fraction of it.
 *
 * @param netHeadM                  net head at the nozzles, m, > 0 and <= 2000
 * @param flowM3s                   total flow, m^3/s, > 0 and <= 10
 * @param jetCount                  number of jets, 1 to 6
 * @param pitchCircleDiameterM      runner pitch-circle diameter (where the jet centreline meets the buckets), m, > 0 and <= 5
 * @param nozzleVelocityCoefficient Cv, 0.90 to 1.0; default 0.98 (well-made nozzles 0.97 to 0.99, e.g. Dixon &amp; Hall,
 *                                  "Fluid Mechanics and Thermodynamics of Turbomachinery", ch. 9; from memory)
 * @param speedRatio                bucket speed / jet speed at the optimum, 0.40 to 0.50; default 0.46 (ideal 0.5,
 *                                  0.46 to 0.47 in practice for losses in the buckets; same source, from memory)
 * @param peakEfficiency            runner efficiency at the optimum, > 0 and <= 0.95 (about 0.8 for a small runner; common practice)
 */
public record ImpulseRunner(double netHeadM, double flowM3s, int jetCount, double pitchCircleDiameterM,
                            double nozzleVelocityCoefficient, double speedRatio, double peakEfficiency)
        implements HydroRunner {
    public static final double DEFAULT_NOZZLE_VELOCITY_COEFFICIENT = 0.98;
    public static final double DEFAULT_SPEED_RATIO = 0.46;
    public static final double DEFAULT_PEAK_EFFICIENCY = 0.80;
    /** Below this pitch-circle to jet diameter ratio buckets get crowded and efficiency falls (common practice). */
    public static final double MIN_DIAMETER_RATIO = 8.0;

    public ImpulseRunner {
        Checks c = new Checks();
        c.rangeExclusiveMin("netHeadM", netHeadM, 0.0, 2000.0);
        c.rangeExclusiveMin("flowM3s", flowM3s, 0.0, 10.0);
        c.intRange("jetCount", jetCount, 1, 6);
        c.rangeExclusiveMin("pitchCircleDiameterM", pitchCircleDiameterM, 0.0, 5.0);
        c.range("nozzleVelocityCoefficient", nozzleVelocityCoefficient, 0.90, 1.0);
        c.range("speedRatio", speedRatio, 0.40, 0.50);
        c.rangeExclusiveMin("peakEfficiency", peakEfficiency, 0.0, 0.95);
        c.throwIfAny();
    }

    /** A Pelton runner with Cv 0.98, speed ratio 0.46 and peak efficiency 0.80. */
    public static ImpulseRunner pelton(double netHeadM, double flowM3s, int jetCount, double pitchCircleDiameterM) {
        return new ImpulseRunner(netHeadM, flowM3s, jetCount, pitchCircleDiameterM,
                DEFAULT_NOZZLE_VELOCITY_COEFFICIENT, DEFAULT_SPEED_RATIO, DEFAULT_PEAK_EFFICIENCY);
    }

    /**
     * A Pelton runner whose pitch-circle diameter is chosen so that its optimum speed is the target:
     * D = 60 x Cv sqrt(2gH) / (pi n).
     *
     * @param targetSpeedRpm the wanted optimum runner speed, rpm, > 0 and <= 6000
     */
    public static ImpulseRunner forTargetSpeed(double netHeadM, double flowM3s, int jetCount, double targetSpeedRpm,
                                               double nozzleVelocityCoefficient, double speedRatio,
                                               double peakEfficiency) {
        new Checks().rangeExclusiveMin("targetSpeedRpm", targetSpeedRpm, 0.0, 6000.0)
                .rangeExclusiveMin("netHeadM", netHeadM, 0.0, 2000.0)
                .range("nozzleVelocityCoefficient", nozzleVelocityCoefficient, 0.90, 1.0)
                .range("speedRatio", speedRatio, 0.40, 0.50).throwIfAny();
        double bucketSpeed = speedRatio * Jets.jetVelocityMs(nozzleVelocityCoefficient, netHeadM);
        return new ImpulseRunner(netHeadM, flowM3s, jetCount, Jets.diameterM(bucketSpeed, targetSpeedRpm),
                nozzleVelocityCoefficient, speedRatio, peakEfficiency);
    }

    /** {@link #forTargetSpeed(double, double, int, double, double, double, double)} with the Pelton defaults. */
    public static ImpulseRunner forTargetSpeed(double netHeadM, double flowM3s, int jetCount, double targetSpeedRpm) {
        return forTargetSpeed(netHeadM, flowM3s, jetCount, targetSpeedRpm, DEFAULT_NOZZLE_VELOCITY_COEFFICIENT,
                DEFAULT_SPEED_RATIO, DEFAULT_PEAK_EFFICIENCY);
    }

    /** Jet velocity Cv sqrt(2 g H), m/s. */
    public double jetVelocityMs() {
        return Jets.jetVelocityMs(nozzleVelocityCoefficient, netHeadM);
    }

    /** Flow per jet, m^3/s. */
    public double flowPerJetM3s() {
        return flowM3s / jetCount;
    }

    /** Jet (nozzle outlet) diameter for the flow per jet, m. */
    public double nozzleDiameterM() {
        return Jets.jetDiameterM(flowPerJetM3s(), jetVelocityMs());
    }

    /** Jet diameter for the flow per jet, m (the same as {@link #nozzleDiameterM()}). */
    public double jetDiameterM() {
        return nozzleDiameterM();
    }

    /** Bucket speed at the optimum, m/s. */
    public double bucketSpeedAtOptimumMs() {
        return speedRatio * jetVelocityMs();
    }

    @Override
    public double optimumSpeedRpm() {
        return Jets.speedRpm(bucketSpeedAtOptimumMs(), pitchCircleDiameterM);
    }

    /** Pitch-circle diameter over jet diameter. */
    public double diameterRatio() {
        return pitchCircleDiameterM / nozzleDiameterM();
    }

    /** Design advice; empty when nothing stands out. */
    public List<String> warnings() {
        List<String> w = new ArrayList<>();
        if (diameterRatio() < MIN_DIAMETER_RATIO) {
            w.add(String.format(Locale.ROOT, "Runner diameter is only %.1f jet diameters (below %.0f): buckets "
                    + "crowd the jet; use more jets or a larger runner", diameterRatio(), MIN_DIAMETER_RATIO));
        }
        return w;
    }
}
