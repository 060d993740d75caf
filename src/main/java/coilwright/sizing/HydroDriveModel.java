package coilwright.sizing;

import coilwright.load.BatteryLoad;
import coilwright.machine.Alternator;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.HydroMatchResult;
import coilwright.system.HydroMatcher;
import coilwright.system.HydroOperatingPoint;
import coilwright.system.RunnerDesign;
import coilwright.system.SpeedPoint;
import coilwright.turbine.CrossflowRunner;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroRunner;
import coilwright.turbine.ImpulseRunner;
import coilwright.turbine.Penstock;
import coilwright.turbine.PenstockResult;
import coilwright.turbine.TurgoRunner;
import coilwright.validation.InfeasibleDesignException;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A hydro site and runner. Full model: {@link HydroMatcher}; the rated point is the matched point at the design
 * flow, with its current density and efficiency from the operating point at the matched speed.
 *
 * <p>Bounds. The matched runner runs at most at its runaway speed (the matcher scans no further) and gives at most
 * its peak shaft power (the power of a straight torque-speed line peaks at its optimum speed); so at each flow the
 * battery power is at most V_b times the smaller of {@link BridgeBounds#maxDcCurrentA} at the runaway speed and
 * {@link BridgeBounds#dcCurrentFromShaftPowerA} at drivetrain efficiency x peak power. The flow-duration sum, whose
 * weights are not negative, carries the bound to the annual energy. The runner and the pipe are solved once per
 * search, at every flow the sum visits, as the matcher solves them.
 */
final class HydroDriveModel implements DriveModel {
    private final HydroDrive drive;
    private final BatteryLoad load;
    private final LoadConstants lc;
    private final double designTopRpm;
    private final double designShaftW;
    /** Per distinct stream flow of the flow-duration curve: weight (kWh per W), top speed (rpm), shaft power (W). */
    private final double[][] flows;

    HydroDriveModel(HydroDrive drive, BatteryLoad load, LoadConstants lc) {
        this.drive = drive;
        this.load = load;
        this.lc = lc;
        Penstock pipe = new Penstock(drive.penstock());
        PenstockResult design = pipe.analyse(drive.site().grossHeadM(), drive.site().designFlowM3s(),
                drive.waterTempC(), Penstock.DEFAULT_MAX_LOSS_SHARE);
        HydroRunner runner = drive.runner().at(design.netHeadM(), design.flowM3s());
        designTopRpm = runner.runawaySpeedRpm() * drive.driveRatio();
        designShaftW = runner.peakShaftPowerW() * drive.drivetrainEfficiency();
        flows = drive.site().hasFlowDuration() ? flowTable(pipe, diameterM(runner)) : new double[0][];
    }

    private double[][] flowTable(Penstock pipe, double diameterM) {
        RunnerDesign fixed = new RunnerDesign(drive.runner().kind(), drive.runner().jetCount(), diameterM,
                drive.runner().targetSpeedRpm(), drive.runner().peakEfficiency());
        Map<Double, double[]> byFlow = new LinkedHashMap<>();
        for (FlowDurationPoint p : drive.site().flowDuration()) {
            byFlow.computeIfAbsent(p.flowM3s(), q -> {
                double weight = drive.site().annualEnergyKWh(x -> x == q ? 1.0 : 0.0);
                double flow = Math.min(q, drive.site().designFlowM3s());
                if (flow <= 0) {
                    return new double[] {weight, 0, 0};
                }
                double head = pipe.analyse(drive.site().grossHeadM(), flow, drive.waterTempC(),
                        Penstock.DEFAULT_MAX_LOSS_SHARE).netHeadM();
                HydroRunner r = fixed.at(head, flow);
                return new double[] {weight, r.runawaySpeedRpm() * drive.driveRatio(),
                        r.peakShaftPowerW() * drive.drivetrainEfficiency()};
            });
        }
        return byFlow.values().toArray(new double[0][]);
    }

    private static double diameterM(HydroRunner r) {
        if (r instanceof ImpulseRunner i) {
            return i.pitchCircleDiameterM();
        }
        return r instanceof TurgoRunner t ? t.pitchCircleDiameterM() : ((CrossflowRunner) r).runnerDiameterM();
    }

    @Override
    public double checkSpeedRpm() {
        return designTopRpm;
    }

    @Override
    public String checkSpeedSource() {
        return "the runner's runaway speed, reached whenever the load is lost";
    }

    @Override
    public double highestCutInRpm() {
        return designTopRpm;
    }

    @Override
    public double ratedLineCurrentFloorA(ScreenValues s) {
        return 0;
    }

    /** Only the diodes are certain to take their share: V_b / (V_b + 2 V_d). */
    @Override
    public double ratedEfficiencyBound(ScreenValues s) {
        return lc.batteryV() / lc.thresholdV();
    }

    @Override
    public double ratedPowerBoundW(ScreenValues s) {
        return boundW(s, designTopRpm, designShaftW);
    }

    private double boundW(ScreenValues s, double topRpm, double shaftW) {
        return lc.batteryV() * Math.min(s.maxDcCurrentA(topRpm, lc), s.dcCurrentFromShaftPowerA(shaftW, lc));
    }

    @Override
    public double energyBoundKWh(ScreenValues s) {
        double sum = 0;
        for (double[] f : flows) {
            if (f[0] > 0 && f[1] > 0) {
                sum += f[0] * boundW(s, f[1], f[2]);
            }
        }
        return sum;
    }

    @Override
    public boolean hasEnergy() {
        return flows.length > 0;
    }

    @Override
    public List<Limit> limits() {
        return List.of(new ChargingLimit(designTopRpm, "the runner's runaway speed at the design flow"));
    }

    @Override
    public FullEvaluation evaluate(Alternator alt) {
        double cutIn = AlternatorEvaluator.closedFormCutInRpm(alt, load);
        HydroMatchResult r;
        try {
            r = HydroMatcher.match(alt, drive.matchRequest(alt.spec(), load));
        } catch (InfeasibleDesignException e) {
            return FullEvaluation.refused(alt.spec(), e.getMessage());
        }
        HydroOperatingPoint m = r.matched();
        if (m.powerToBatteryW() <= 0) {
            return FullEvaluation.neverCharges(alt, cutIn, r.openCircuitLineRmsVAtRunaway(),
                    r.runawayAlternatorSpeedRpm());
        }
        SpeedPoint rated = AlternatorEvaluator.point(alt, load, m.alternatorSpeedRpm());
        return new FullEvaluation(alt.spec(), "", true, cutIn, 0, rated.speedRpm(), rated.powerToLoadW(),
                rated.efficiency(), rated.currentDensityAPerMm2(), FullEvaluation.fillOf(alt),
                r.openCircuitLineRmsVAtRunaway(), r.runawayAlternatorSpeedRpm(), alt.copperMassKg(),
                alt.magnetMassKg(), r.annualEnergyKWh().orElse(0));
    }
}
