package coilwright.system;

import coilwright.turbine.WindRotor;
import coilwright.validation.Checks;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Matches a wind rotor to an alternator and its load at one wind speed: the speed where the rotor's torque,
 * brought to the alternator shaft through the drive ratio and drivetrain efficiency, equals the torque the
 * alternator takes (the first stable crossing from rest, {@link TorqueMatch}). The rotor model is the
 * actuator-disc power with a Cp curve ({@link WindRotor}); the alternator's torque comes from its solved
 * operating points ({@link AlternatorCurve}).
 *
 * <p>Running drag ({@link RunningDrag}: bearings, windage, iron, conductor eddy currents, delta circulating current)
 * adds to the alternator's torque when given, so the rotor turns slower below cut-in and charging starts at the wind
 * that overcomes it.
 *
 * <p>Over-speed: when that equilibrium lies above the rotor's maximum speed, the furling or governor is taken
 * to hold the rotor at the maximum speed, shedding the surplus; the alternator then delivers its output at that
 * speed and the rotor power reported is what the alternator takes. The unlimited equilibrium is reported too.
 */
public final class WindMatcher {
    /**
     * A point whose tip-speed ratio is below this share of the optimum is flagged {@link MatchFlag#STALL}. This
     * project's choice: at 0.6 lambda_opt the parametric Cp curve has lost a third of its peak (Cp/Cpmax = 0.6 x
     * (1 + 0.6 - 0.36) = 0.74 there, 0.5 at 0.4 lambda_opt), which is where a poorly matched rotor starts to be
     * noticed in practice (common practice).
     */
    public static final double STALL_TSR_SHARE = 0.6;
    /** Intervals of the alternator-speed scan grid from 0 to the free-spinning speed at the top wind speed. */
    public static final int GRID_STEPS = 240;

    private final AlternatorCurve alternator;
    private final WindRotor rotor;
    private final double airDensityKgM3;
    private final double[] gridRpm;
    private final RunningDrag drag;

    /** As {@link #WindMatcher(AlternatorCurve, WindRotor, double, double, RunningDrag)} with no running drag. */
    public WindMatcher(AlternatorCurve alternator, WindRotor rotor, double airDensityKgM3, double topWindSpeedMs) {
        this(alternator, rotor, airDensityKgM3, topWindSpeedMs, RunningDrag.none());
    }

    /**
     * @param alternator      the alternator and load as a torque curve
     * @param rotor           the wind rotor
     * @param airDensityKgM3  air density, kg/m^3, > 0 and <= 2
     * @param topWindSpeedMs  the highest wind speed to be matched, m/s, > 0 and <= 100 (sets the scan grid)
     * @param drag            the alternator's running drag, added to its load torque
     */
    public WindMatcher(AlternatorCurve alternator, WindRotor rotor, double airDensityKgM3, double topWindSpeedMs,
                       RunningDrag drag) {
        new Checks().present("alternator", alternator).present("rotor", rotor).present("drag", drag)
                .rangeExclusiveMin("airDensityKgM3", airDensityKgM3, 0.0, 2.0)
                .rangeExclusiveMin("topWindSpeedMs", topWindSpeedMs, 0.0, 100.0).throwIfAny();
        this.alternator = alternator;
        this.rotor = rotor;
        this.airDensityKgM3 = airDensityKgM3;
        this.drag = drag;
        this.gridRpm = TorqueMatch.grid(rotor.alternatorSpeedRpm(rotor.freeSpinSpeedRpm(topWindSpeedMs)), GRID_STEPS);
    }

    /**
     * The matched operating point at a wind speed.
     *
     * @param windSpeedMs wind speed, m/s, 0 to 100
     */
    public WindMatchPoint at(double windSpeedMs) {
        new Checks().range("windSpeedMs", windSpeedMs, 0.0, 100.0).throwIfAny();
        if (windSpeedMs == 0.0) {
            return WindMatchPoint.calm();
        }
        double v = windSpeedMs;
        double efficiency = rotor.drivetrainEfficiency();
        double freeSpinAltRpm = rotor.alternatorSpeedRpm(rotor.freeSpinSpeedRpm(v));
        DoubleUnaryOperator residual = n -> rotor.alternatorShaftTorqueNm(v, n, airDensityKgM3) - alternator.torqueNm(n)
                - drag.torqueNm(n);
        double equilibriumAltRpm = TorqueMatch.firstStableCrossingRpm(residual, gridRpm, freeSpinAltRpm);
        double unlimitedRotorRpm = rotor.rotorSpeedRpm(equilibriumAltRpm);
        boolean overSpeed = rotor.isOverSpeed(unlimitedRotorRpm);
        double rotorRpm = overSpeed ? rotor.maxRotorSpeedRpm() : unlimitedRotorRpm;
        SpeedPoint alt = alternator.at(rotor.alternatorSpeedRpm(rotorRpm));
        double dragW = drag.powerW(alt.speedRpm());
        double altShaftW = alt.shaftPowerW() + dragW;
        boolean freeSpinning = alt.shaftTorqueNm() == 0.0;
        // free-spinning (no load current): the rotor delivers only what the drag takes, zero without drag (Cp is zero
        // at the runaway tip-speed ratio; this avoids rounding dust)
        double rotorPowerW = overSpeed || freeSpinning ? altShaftW / efficiency
                : rotor.powerW(v, rotorRpm, airDensityKgM3);
        double tsr = rotor.tipSpeedRatio(v, rotorRpm);

        List<MatchFlag> flags = new ArrayList<>();
        if (freeSpinning) {
            flags.add(MatchFlag.FREE_SPINNING);
        } else if (!overSpeed && tsr < STALL_TSR_SHARE * rotor.curve().optimumTipSpeedRatio()) {
            flags.add(MatchFlag.STALL);
        }
        if (overSpeed) {
            flags.add(MatchFlag.OVER_SPEED);
        }

        double idealRotorW = rotor.idealPowerW(v, airDensityKgM3);
        double idealAltEfficiency = freeSpinning ? idealSpeedEfficiency(v) : efficiencyWithDrag(alt);
        double capture = idealRotorW > 0 ? Math.min(1.0, rotorPowerW / idealRotorW) : 0.0;
        return new WindMatchPoint(v, rotorRpm, alt.speedRpm(), unlimitedRotorRpm, tsr,
                rotorPowerW / rotor.windPowerW(v, airDensityKgM3), rotorPowerW, rotorPowerW * (1.0 - efficiency),
                altShaftW, alt.powerToLoadW(), alt.windingCopperLossW(), alt.cableLossW(),
                alt.batteryInternalLossW(), alt.diodeLossW(), alt.dcCurrentA(), idealRotorW,
                idealRotorW * efficiency * idealAltEfficiency, capture, flags, dragW);
    }

    /** Power to the load over the alternator's shaft power, its running drag counted (0 where nothing flows). */
    private double efficiencyWithDrag(SpeedPoint alt) {
        double shaft = alt.shaftPowerW() + drag.powerW(alt.speedRpm());
        return shaft > 0 ? alt.powerToLoadW() / shaft : 0;
    }

    /** The alternator's efficiency at the speed of the ideal rotor (optimum tip-speed ratio, capped). */
    private double idealSpeedEfficiency(double windSpeedMs) {
        double idealRotorRpm = rotor.optimumRotorSpeedRpm(windSpeedMs);
        if (rotor.maxRotorSpeedRpm() > 0) {
            idealRotorRpm = Math.min(idealRotorRpm, rotor.maxRotorSpeedRpm());
        }
        return efficiencyWithDrag(alternator.at(rotor.alternatorSpeedRpm(idealRotorRpm)));
    }

    /**
     * The alternator's demand referred to the rotor shaft from standstill to a top rotor speed, on the scan grid.
     *
     * @param topRotorSpeedRpm top rotor speed, rpm, > 0
     */
    public List<LoadCurvePoint> loadCurve(double topRotorSpeedRpm) {
        new Checks().positive("topRotorSpeedRpm", topRotorSpeedRpm).throwIfAny();
        double topAlt = rotor.alternatorSpeedRpm(topRotorSpeedRpm);
        List<LoadCurvePoint> out = new ArrayList<>();
        for (double n : gridRpm) {
            if (n > topAlt) {
                break;
            }
            out.add(loadPoint(n));
        }
        if (out.isEmpty() || out.get(out.size() - 1).alternatorSpeedRpm() < topAlt) {
            out.add(loadPoint(topAlt));
        }
        return out;
    }

    private LoadCurvePoint loadPoint(double alternatorRpm) {
        SpeedPoint p = alternator.at(alternatorRpm);
        double eta = rotor.drivetrainEfficiency();
        return new LoadCurvePoint(rotor.rotorSpeedRpm(alternatorRpm), alternatorRpm,
                (p.shaftTorqueNm() + drag.torqueNm(alternatorRpm)) * rotor.driveRatio() / eta,
                (p.shaftPowerW() + drag.powerW(alternatorRpm)) / eta, p.powerToLoadW());
    }

    public WindRotor rotor() {
        return rotor;
    }

    public double airDensityKgM3() {
        return airDensityKgM3;
    }
}
