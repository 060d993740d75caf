package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.function.DoubleUnaryOperator;

/**
 * A horizontal-axis wind rotor: P = 0.5 rho A v^3 Cp(lambda), lambda = omega R / v (actuator-disc
 * power with a measured or assumed Cp curve; see Manwell, McGowan &amp; Rogers, "Wind Energy Explained",
 * ch. 3). Torque and power are given as functions of rotor speed, and of alternator speed through the
 * drive ratio, so a load can be matched to them.
 *
 * @param diameterM             rotor diameter, m, > 0 and <= 30
 * @param bladeCount            number of blades, 1 to 12 (kept for the record and checks; Cp already holds its effect)
 * @param curve                 the power-coefficient curve
 * @param maxRotorSpeedRpm      furling or governor speed limit, rpm; 0 means none
 * @param driveRatio            alternator speed / rotor speed, > 0 and <= 50; 1 for direct drive
 * @param drivetrainEfficiency  gearbox or belt efficiency between rotor and alternator, 0.5 to 1
 */
public record WindRotor(double diameterM, int bladeCount, PowerCoefficientCurve curve, double maxRotorSpeedRpm,
                        double driveRatio, double drivetrainEfficiency) {
    private static final double RPM_TO_RAD_S = Math.PI / 30.0;
    /** Steps from runaway down to standstill when bracketing the unloaded speed. */
    private static final int UNLOADED_SCAN_STEPS = 64;
    /** Accuracy of the unloaded speed, rpm. */
    private static final double UNLOADED_ACCURACY_RPM = 1e-3;

    public WindRotor {
        Checks c = new Checks();
        c.rangeExclusiveMin("diameterM", diameterM, 0.0, 30.0);
        c.intRange("bladeCount", bladeCount, 1, 12);
        c.present("curve", curve);
        c.nonNegative("maxRotorSpeedRpm", maxRotorSpeedRpm);
        c.rangeExclusiveMin("driveRatio", driveRatio, 0.0, 50.0);
        c.range("drivetrainEfficiency", drivetrainEfficiency, 0.5, 1.0);
        c.throwIfAny();
    }

    /** A direct-drive rotor (drive ratio 1, no drivetrain loss). */
    public WindRotor(double diameterM, int bladeCount, PowerCoefficientCurve curve, double maxRotorSpeedRpm) {
        this(diameterM, bladeCount, curve, maxRotorSpeedRpm, 1.0, 1.0);
    }

    /** A rotor with a drive ratio and no drivetrain loss. */
    public WindRotor(double diameterM, int bladeCount, PowerCoefficientCurve curve, double maxRotorSpeedRpm,
                     double driveRatio) {
        this(diameterM, bladeCount, curve, maxRotorSpeedRpm, driveRatio, 1.0);
    }

    /** Radius, m. */
    public double radiusM() {
        return diameterM / 2.0;
    }

    /** Swept area pi R^2, m^2. */
    public double sweptAreaM2() {
        return Math.PI * radiusM() * radiusM();
    }

    /**
     * Tip-speed ratio lambda = omega R / v.
     *
     * @param windSpeedMs   free-stream wind speed, m/s, > 0 and <= 100
     * @param rotorSpeedRpm rotor speed, rpm, >= 0
     */
    public double tipSpeedRatio(double windSpeedMs, double rotorSpeedRpm) {
        new Checks().rangeExclusiveMin("windSpeedMs", windSpeedMs, 0.0, 100.0)
                .nonNegative("rotorSpeedRpm", rotorSpeedRpm).throwIfAny();
        return rotorSpeedRpm * RPM_TO_RAD_S * radiusM() / windSpeedMs;
    }

    /**
     * Aerodynamic power at the rotor shaft, P = 0.5 rho A v^3 Cp(lambda), W. 0 in still air.
     *
     * @param windSpeedMs      wind speed, m/s, 0 to 100
     * @param rotorSpeedRpm    rotor speed, rpm, >= 0
     * @param airDensityKgM3   air density, kg/m^3, > 0 and <= 2 (see {@link AirDensity})
     */
    public double powerW(double windSpeedMs, double rotorSpeedRpm, double airDensityKgM3) {
        checkOperatingPoint(windSpeedMs, rotorSpeedRpm, airDensityKgM3);
        if (windSpeedMs == 0.0) {
            return 0.0;
        }
        double cp = curve.cp(tipSpeedRatio(windSpeedMs, rotorSpeedRpm));
        return 0.5 * airDensityKgM3 * sweptAreaM2() * Math.pow(windSpeedMs, 3) * cp;
    }

    /**
     * Aerodynamic torque at the rotor shaft, T = 0.5 rho A R v^2 Cq(lambda), N m; finite at zero speed
     * (the starting torque). 0 in still air.
     *
     * @param windSpeedMs      wind speed, m/s, 0 to 100
     * @param rotorSpeedRpm    rotor speed, rpm, >= 0
     * @param airDensityKgM3   air density, kg/m^3, > 0 and <= 2
     */
    public double torqueNm(double windSpeedMs, double rotorSpeedRpm, double airDensityKgM3) {
        checkOperatingPoint(windSpeedMs, rotorSpeedRpm, airDensityKgM3);
        if (windSpeedMs == 0.0) {
            return 0.0;
        }
        double cq = curve.torqueCoefficient(tipSpeedRatio(windSpeedMs, rotorSpeedRpm));
        return 0.5 * airDensityKgM3 * sweptAreaM2() * radiusM() * windSpeedMs * windSpeedMs * cq;
    }

    /**
     * Torque delivered to the alternator shaft at an alternator speed: rotor torque times drivetrain
     * efficiency divided by the drive ratio, N m.
     *
     * @param windSpeedMs          wind speed, m/s, 0 to 100
     * @param alternatorSpeedRpm   alternator speed, rpm, >= 0
     * @param airDensityKgM3       air density, kg/m^3, > 0 and <= 2
     */
    public double alternatorShaftTorqueNm(double windSpeedMs, double alternatorSpeedRpm, double airDensityKgM3) {
        return torqueNm(windSpeedMs, rotorSpeedRpm(alternatorSpeedRpm), airDensityKgM3)
                * drivetrainEfficiency / driveRatio;
    }

    /**
     * Power delivered to the alternator shaft at an alternator speed: rotor power times drivetrain
     * efficiency, W.
     */
    public double alternatorShaftPowerW(double windSpeedMs, double alternatorSpeedRpm, double airDensityKgM3) {
        return powerW(windSpeedMs, rotorSpeedRpm(alternatorSpeedRpm), airDensityKgM3) * drivetrainEfficiency;
    }

    /** Rotor speed for an alternator speed, rpm. */
    public double rotorSpeedRpm(double alternatorSpeedRpm) {
        new Checks().nonNegative("alternatorSpeedRpm", alternatorSpeedRpm).throwIfAny();
        return alternatorSpeedRpm / driveRatio;
    }

    /** Alternator speed for a rotor speed, rpm. */
    public double alternatorSpeedRpm(double rotorSpeedRpm) {
        new Checks().nonNegative("rotorSpeedRpm", rotorSpeedRpm).throwIfAny();
        return rotorSpeedRpm * driveRatio;
    }

    /**
     * Rotor speed at the curve's optimum tip-speed ratio (largest Cp), rpm; ignores the speed limit.
     *
     * @param windSpeedMs wind speed, m/s, 0 to 100
     */
    public double optimumRotorSpeedRpm(double windSpeedMs) {
        return speedForTipSpeedRatio(windSpeedMs, curve.optimumTipSpeedRatio());
    }

    /**
     * Unloaded (free-spinning, runaway) rotor speed where Cp returns to 0, rpm; ignores the speed limit,
     * since furling or a governor may fail.
     *
     * @param windSpeedMs wind speed, m/s, 0 to 100
     */
    public double freeSpinSpeedRpm(double windSpeedMs) {
        return speedForTipSpeedRatio(windSpeedMs, curve.runawayTipSpeedRatio());
    }

    /** The tip-speed ratio at which the curve's Cp returns to 0: no rotor spins faster than this, loaded or not. */
    public double runawayTipSpeedRatio() {
        return curve.runawayTipSpeedRatio();
    }

    /**
     * Torque of the rotor held still, 0.5 rho A R v^2 Cq0, N m.
     *
     * @param windSpeedMs                wind speed, m/s, 0 to 100
     * @param airDensityKgM3             air density, kg/m^3, &gt; 0 and &lt;= 2
     * @param startingTorqueCoefficient  Cq0 (see {@link StartingTorque}), &gt;= 0
     */
    public double standstillTorqueNm(double windSpeedMs, double airDensityKgM3, double startingTorqueCoefficient) {
        checkOperatingPoint(windSpeedMs, 0.0, airDensityKgM3);
        new Checks().nonNegative("startingTorqueCoefficient", startingTorqueCoefficient).throwIfAny();
        return 0.5 * airDensityKgM3 * sweptAreaM2() * radiusM() * windSpeedMs * windSpeedMs * startingTorqueCoefficient;
    }

    /**
     * Speed of the rotor turning freely against a drag torque (bearings, windage, an unloaded alternator's iron loss
     * and delta circulating current, referred to the rotor shaft): the highest speed at which the rotor's torque
     * equals the drag, found between standstill and the curve's runaway speed with Brent's method. It never exceeds
     * {@link #freeSpinSpeedRpm(double)}; 0 when the drag at standstill exceeds the rotor's torque there.
     *
     * @param windSpeedMs          wind speed, m/s, 0 to 100
     * @param airDensityKgM3       air density, kg/m^3, &gt; 0 and &lt;= 2
     * @param dragTorqueAtRotorNm  drag torque at the rotor shaft as a function of rotor speed (rpm), N m, &gt;= 0
     * @return rotor speed, rpm
     */
    public double unloadedRotorSpeedRpm(double windSpeedMs, double airDensityKgM3,
                                        DoubleUnaryOperator dragTorqueAtRotorNm) {
        checkOperatingPoint(windSpeedMs, 0.0, airDensityKgM3);
        new Checks().present("dragTorqueAtRotorNm", dragTorqueAtRotorNm).throwIfAny();
        double runaway = freeSpinSpeedRpm(windSpeedMs);
        if (windSpeedMs == 0.0 || runaway == 0.0) {
            return 0.0;
        }
        DoubleUnaryOperator net = n -> torqueNm(windSpeedMs, n, airDensityKgM3)
                - dragTorqueAtRotorNm.applyAsDouble(n);
        if (net.applyAsDouble(runaway) >= 0) {
            return runaway;
        }
        double high = runaway;
        for (int i = 1; i <= UNLOADED_SCAN_STEPS; i++) {
            double low = runaway * (UNLOADED_SCAN_STEPS - i) / UNLOADED_SCAN_STEPS;
            if (net.applyAsDouble(low) >= 0) {
                try {
                    return new BrentSolver(UNLOADED_ACCURACY_RPM).solve(200, net::applyAsDouble, low, high);
                } catch (org.apache.commons.math3.exception.MathIllegalStateException
                         | org.apache.commons.math3.exception.MathIllegalArgumentException e) {
                    throw new SolverFailedException("", String.format(java.util.Locale.ROOT, "The rotor's unloaded "
                            + "speed at %.4g m/s was not settled between %.6g and %.6g rpm (%s); please report the "
                            + "design.", windSpeedMs, low, high, e.getMessage()), e);
                }
            }
            high = low;
        }
        return 0.0;
    }

    /**
     * Ideal rotor power: the rotor at its optimum tip-speed ratio, or held at the speed limit when the
     * optimum lies above it, W. The benchmark against which a matched alternator is judged.
     */
    public double idealPowerW(double windSpeedMs, double airDensityKgM3) {
        double speedRpm = optimumRotorSpeedRpm(windSpeedMs);
        if (maxRotorSpeedRpm > 0) {
            speedRpm = Math.min(speedRpm, maxRotorSpeedRpm);
        }
        return powerW(windSpeedMs, speedRpm, airDensityKgM3);
    }

    /** True when a speed limit is set and the rotor speed exceeds it. */
    public boolean isOverSpeed(double rotorSpeedRpm) {
        return maxRotorSpeedRpm > 0 && rotorSpeedRpm > maxRotorSpeedRpm;
    }

    /** Power available in the wind through the swept area, 0.5 rho A v^3, W. */
    public double windPowerW(double windSpeedMs, double airDensityKgM3) {
        checkOperatingPoint(windSpeedMs, 0.0, airDensityKgM3);
        return 0.5 * airDensityKgM3 * sweptAreaM2() * Math.pow(windSpeedMs, 3);
    }

    private double speedForTipSpeedRatio(double windSpeedMs, double tipSpeedRatio) {
        new Checks().range("windSpeedMs", windSpeedMs, 0.0, 100.0).throwIfAny();
        return tipSpeedRatio * windSpeedMs / radiusM() / RPM_TO_RAD_S;
    }

    private static void checkOperatingPoint(double windSpeedMs, double rotorSpeedRpm, double airDensityKgM3) {
        Checks c = new Checks();
        c.range("windSpeedMs", windSpeedMs, 0.0, 100.0);
        c.nonNegative("rotorSpeedRpm", rotorSpeedRpm);
        c.rangeExclusiveMin("airDensityKgM3", airDensityKgM3, 0.0, 2.0);
        c.throwIfAny();
    }
}
