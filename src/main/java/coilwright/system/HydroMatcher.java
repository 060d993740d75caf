package coilwright.system;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.safety.Caution;
import coilwright.safety.MachineLimitCautions;
import coilwright.turbine.CrossflowRunner;
import coilwright.turbine.HydroRunner;
import coilwright.turbine.ImpulseRunner;
import coilwright.turbine.Penstock;
import coilwright.turbine.PenstockResult;
import coilwright.turbine.TurgoRunner;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Matches a micro-hydro runner to an alternator and load. Net head from the penstock (Darcy-Weisbach with
 * Colebrook, {@link Penstock}); the runner's straight torque-speed line ({@link HydroRunner}) brought to the
 * alternator shaft through the drive ratio and efficiency; the matched speed is the first stable crossing of
 * runner and alternator torque from rest ({@link TorqueMatch}). Annual energy from the flow-duration curve
 * ({@link coilwright.turbine.HydroSite#annualEnergyKWh}): at each stream flow the plant takes
 * min(stream flow, design flow) with the runner's diameter fixed and the net head of that flow, re-matched.
 */
public final class HydroMatcher {
    /** Runner speeds below this share of the optimum are flagged STALL (this project's choice, as for wind). */
    public static final double LOW_SPEED_SHARE = 0.6;
    /** Runner speeds above this share of the optimum are flagged ABOVE_OPTIMUM (this project's choice). */
    public static final double HIGH_SPEED_SHARE = 1.2;
    /** Intervals of the scan grid from 0 to runaway. */
    public static final int GRID_STEPS = 160;
    private static final int CURVE_POINTS = 41;

    private HydroMatcher() {
    }

    /**
     * @throws coilwright.validation.InvalidInputException     when an input is out of range
     * @throws coilwright.validation.InfeasibleDesignException when the machine cannot be built, the penstock uses up the
     *                                                         head, or no runner fits the target speed
     */
    public static HydroMatchResult match(HydroMatchRequest req) {
        return match(AlternatorModel.build(req.alternator()), req);
    }

    /** As {@link #match(HydroMatchRequest)} with an already-built alternator. */
    public static HydroMatchResult match(Alternator alt, HydroMatchRequest req) {
        Penstock pipe = new Penstock(req.penstock());
        PenstockResult design = pipe.analyse(req.site().grossHeadM(), req.site().designFlowM3s(), req.waterTempC(),
                Penstock.DEFAULT_MAX_LOSS_SHARE);
        HydroRunner runner = req.runner().at(design.netHeadM(), design.flowM3s());
        AlternatorCurve curve = new AlternatorCurve(alt, req.load());
        HydroOperatingPoint matched = matchAt(curve, runner, req.driveRatio(), req.drivetrainEfficiency());
        double diameterM = diameter(runner);

        OptionalDouble annual = OptionalDouble.empty();
        if (req.site().hasFlowDuration()) {
            annual = OptionalDouble.of(req.site().annualEnergyKWh(q -> {
                double flow = Math.min(q, req.site().designFlowM3s());
                if (flow <= 0) {
                    return 0.0;
                }
                double head = pipe.analyse(req.site().grossHeadM(), flow, req.waterTempC(), Penstock.DEFAULT_MAX_LOSS_SHARE)
                        .netHeadM();
                HydroRunner r = fixedDiameter(req.runner(), diameterM).at(head, flow);
                return matchAt(curve, r, req.driveRatio(), req.drivetrainEfficiency()).powerToBatteryW();
            }));
        }

        double runawayAlt = runner.runawaySpeedRpm() * req.driveRatio();
        List<Caution> cautions = new ArrayList<>(AlternatorEvaluator.cautionsAt(alt, req.load(), runawayAlt,
                "the runner's runaway speed, reached whenever the load is lost", matched.powerToBatteryW(),
                matched.dcCurrentA()));
        LossPoint heat = heatAt(alt, req, matched.alternatorSpeedRpm());
        MachineLimitCautions.windingTemperature(Math.min(heat.windingHotSpotC(), 1000), alt.spec().insulationClass(),
                String.format(Locale.ROOT, "at the matched speed (%.0f rpm at the alternator)", heat.speedRpm()),
                false).ifPresent(cautions::add);
        cautions.sort(java.util.Comparator.comparing(Caution::severity));
        List<RunnerCurvePoint> runnerCurve = new ArrayList<>();
        List<LoadCurvePoint> altCurve = new ArrayList<>();
        for (int k = 0; k < CURVE_POINTS; k++) {
            double n = runner.runawaySpeedRpm() * k / (CURVE_POINTS - 1);
            runnerCurve.add(new RunnerCurvePoint(n, runner.torqueNm(n), runner.powerW(n)));
            SpeedPoint p = curve.at(n * req.driveRatio());
            double eta = req.drivetrainEfficiency();
            altCurve.add(new LoadCurvePoint(n, p.speedRpm(), p.shaftTorqueNm() * req.driveRatio() / eta,
                    p.shaftPowerW() / eta, p.powerToLoadW()));
        }
        List<String> warnings = new ArrayList<>(alt.warnings());
        warnings.addAll(design.warnings());
        if (runner instanceof ImpulseRunner impulse) {
            warnings.addAll(impulse.warnings());
        }
        warnings.addAll(matchWarnings(matched));
        return new HydroMatchResult(design, req.runner().kind(), diameterM, jetVelocity(runner), nozzleDiameter(runner),
                runner.hydraulicPowerW(), runner.peakShaftPowerW(), runner.optimumSpeedRpm(), runner.runawaySpeedRpm(),
                runawayAlt, curve.openCircuitLineRmsV(runawayAlt), matched, matched.powerToBatteryW() * 24.0 / 1000.0,
                annual, runnerCurve, altCurve, cautions, warnings, heat);
    }

    /**
     * The steady winding temperature and every loss at the matched alternator speed (a hydro plant runs at one point
     * for days, so its steady temperature is the one the winding reaches), capped at the models' top speed.
     */
    static LossPoint heatAt(Alternator alt, HydroMatchRequest req, double alternatorRpm) {
        return new MachineLosses(alt, req.load(), alt.spec().ambientTempC())
                .steadyAt(Math.min(alternatorRpm, MachineLosses.maxSpeedRpm(alt)));
    }

    /**
     * The matched point of one runner with the alternator.
     *
     * @param driveRatio            alternator speed / runner speed, > 0
     * @param drivetrainEfficiency  0 to 1
     */
    public static HydroOperatingPoint matchAt(AlternatorCurve alternator, HydroRunner runner, double driveRatio,
                                              double drivetrainEfficiency) {
        double runawayAlt = runner.runawaySpeedRpm() * driveRatio;
        double[] grid = TorqueMatch.grid(runawayAlt, GRID_STEPS);
        double altRpm = TorqueMatch.firstStableCrossingRpm(
                n -> runner.torqueNm(n / driveRatio) * drivetrainEfficiency / driveRatio - alternator.torqueNm(n),
                grid, runawayAlt);
        double runnerRpm = altRpm / driveRatio;
        SpeedPoint p = alternator.at(altRpm);
        double runnerW = runner.powerW(runnerRpm);
        double share = runnerRpm / runner.optimumSpeedRpm();
        List<MatchFlag> flags = new ArrayList<>();
        if (p.shaftTorqueNm() == 0.0) {
            flags.add(MatchFlag.FREE_SPINNING);
        } else if (share < LOW_SPEED_SHARE) {
            flags.add(MatchFlag.STALL);
        } else if (share > HIGH_SPEED_SHARE) {
            flags.add(MatchFlag.ABOVE_OPTIMUM);
        }
        return new HydroOperatingPoint(runner.flowM3s(), runner.netHeadM(), runnerRpm, altRpm, share, runnerW,
                runnerW * (1.0 - drivetrainEfficiency), p.shaftPowerW(), p.powerToLoadW(), p.windingCopperLossW(),
                p.cableLossW(), p.batteryInternalLossW(), p.diodeLossW(), p.dcCurrentA(), flags);
    }

    private static List<String> matchWarnings(HydroOperatingPoint m) {
        List<String> w = new ArrayList<>();
        if (m.flags().contains(MatchFlag.FREE_SPINNING)) {
            w.add(String.format(Locale.ROOT, "The alternator does not cut in below the runner's runaway speed (%.0f rpm at "
                    + "the alternator): nothing is charged. Use more turns or a higher drive ratio.", m.alternatorSpeedRpm()));
        } else if (m.flags().contains(MatchFlag.STALL)) {
            w.add(String.format(Locale.ROOT, "The runner is held at %.0f %% of its best speed: the alternator takes too much "
                    + "torque. Fewer turns, a lower drive ratio or a higher battery voltage bring it nearer.", 100 * m.speedShareOfOptimum()));
        } else if (m.flags().contains(MatchFlag.ABOVE_OPTIMUM)) {
            w.add(String.format(Locale.ROOT, "The runner runs at %.0f %% of its best speed, towards runaway: the alternator "
                    + "takes too little torque. More turns or a higher drive ratio load it harder.", 100 * m.speedShareOfOptimum()));
        }
        return w;
    }

    private static RunnerDesign fixedDiameter(RunnerDesign d, double diameterM) {
        return new RunnerDesign(d.kind(), d.jetCount(), diameterM, d.targetSpeedRpm(), d.peakEfficiency());
    }

    private static double diameter(HydroRunner r) {
        if (r instanceof ImpulseRunner i) {
            return i.pitchCircleDiameterM();
        }
        return r instanceof TurgoRunner t ? t.pitchCircleDiameterM() : ((CrossflowRunner) r).runnerDiameterM();
    }

    private static double jetVelocity(HydroRunner r) {
        if (r instanceof ImpulseRunner i) {
            return i.jetVelocityMs();
        }
        return r instanceof TurgoRunner t ? t.jetVelocityMs() : 0.0;
    }

    private static double nozzleDiameter(HydroRunner r) {
        if (r instanceof ImpulseRunner i) {
            return i.nozzleDiameterM();
        }
        return r instanceof TurgoRunner t ? t.nozzleDiameterM() : 0.0;
    }
}
