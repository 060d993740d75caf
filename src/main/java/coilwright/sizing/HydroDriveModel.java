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
 * <p>Bounds. The matched runner runs at most at its runaway speed (the matcher scans no further), and the battery
 * charges only with the alternator at or above its cut-in speed; a straight torque-speed line gives a power that
 * rises to its optimum speed and falls after it, so the runner gives at most its power at the optimum speed clamped
 * into that range. At each flow the battery power is at most V_b times the smaller of
 * {@link BridgeBounds#maxDcCurrentA} at the runaway speed and {@link BridgeBounds#dcCurrentFromShaftPowerA} at
 * drivetrain efficiency x that power. The flow-duration sum, whose weights are not negative, carries the bound to
 * the annual energy. The runner and the pipe are solved once per search, at every flow the sum visits, as the
 * matcher solves them.
 */
final class HydroDriveModel implements DriveModel {
    private final HydroDrive drive;
    private final BatteryLoad load;
    private final LoadConstants lc;
    private final HydroRunner designRunner;
    private final double designTopRpm;
    /** Per distinct stream flow of the flow-duration curve that the plant takes: its weight, kWh per W. */
    private final double[] flowWeights;
    /** The runner at each of those flows. */
    private final HydroRunner[] flowRunners;

    HydroDriveModel(HydroDrive drive, BatteryLoad load, LoadConstants lc) {
        this.drive = drive;
        this.load = load;
        this.lc = lc;
        Penstock pipe = new Penstock(drive.penstock());
        PenstockResult design = pipe.analyse(drive.site().grossHeadM(), drive.site().designFlowM3s(),
                drive.waterTempC(), Penstock.DEFAULT_MAX_LOSS_SHARE);
        designRunner = drive.runner().at(design.netHeadM(), design.flowM3s());
        designTopRpm = designRunner.runawaySpeedRpm() * drive.driveRatio();
        Map<Double, HydroRunner> byFlow = drive.site().hasFlowDuration() ? flowTable(pipe, diameterM(designRunner))
                : Map.of();
        flowWeights = new double[byFlow.size()];
        flowRunners = new HydroRunner[byFlow.size()];
        int i = 0;
        for (Map.Entry<Double, HydroRunner> e : byFlow.entrySet()) {
            double q = e.getKey();
            flowWeights[i] = drive.site().annualEnergyKWh(x -> x == q ? 1.0 : 0.0);
            flowRunners[i++] = e.getValue();
        }
    }

    /** The runner at every distinct stream flow the plant takes (none below zero), its diameter fixed. */
    private Map<Double, HydroRunner> flowTable(Penstock pipe, double diameterM) {
        RunnerDesign fixed = new RunnerDesign(drive.runner().kind(), drive.runner().jetCount(), diameterM,
                drive.runner().targetSpeedRpm(), drive.runner().peakEfficiency());
        Map<Double, HydroRunner> byFlow = new LinkedHashMap<>();
        for (FlowDurationPoint p : drive.site().flowDuration()) {
            double flow = Math.min(p.flowM3s(), drive.site().designFlowM3s());
            if (flow > 0 && !byFlow.containsKey(p.flowM3s())) {
                double head = pipe.analyse(drive.site().grossHeadM(), flow, drive.waterTempC(),
                        Penstock.DEFAULT_MAX_LOSS_SHARE).netHeadM();
                byFlow.put(p.flowM3s(), fixed.at(head, flow));
            }
        }
        return byFlow;
    }

    private static double diameterM(HydroRunner r) {
        if (r instanceof ImpulseRunner i) {
            return i.pitchCircleDiameterM();
        }
        return r instanceof TurgoRunner t ? t.pitchCircleDiameterM() : ((CrossflowRunner) r).runnerDiameterM();
    }

    @Override
    public LoadConstants constants() {
        return lc;
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
    public double ratedPowerBoundW(ScreenValues s) {
        return boundW(s, designRunner);
    }

    private double boundW(ScreenValues s, HydroRunner r) {
        double ratio = drive.driveRatio();
        double topRpm = r.runawaySpeedRpm() * ratio;
        double lowestRunnerRpm = s.cutInRpm * (1 - Limit.SCREEN_MARGIN) / ratio;
        if (lowestRunnerRpm >= r.runawaySpeedRpm()) {
            return 0;
        }
        double shaftW = drive.drivetrainEfficiency() * r.powerW(Math.max(lowestRunnerRpm, r.optimumSpeedRpm()));
        return lc.batteryV() * Math.min(s.maxDcCurrentA(topRpm, lc), s.dcCurrentFromShaftPowerA(shaftW, lc));
    }

    @Override
    public double ratedShaftTorqueBoundNm(ScreenValues s) {
        double lowestRunnerRpm = s.cutInRpm * (1 - Limit.SCREEN_MARGIN) / drive.driveRatio();
        if (lowestRunnerRpm >= designRunner.runawaySpeedRpm()) {
            return 0;
        }
        double shaftW = drive.drivetrainEfficiency()
                * designRunner.powerW(Math.max(lowestRunnerRpm, designRunner.optimumSpeedRpm()));
        return DriveModel.torqueBoundNm(shaftW, s.cutInRpm * (1 - Limit.SCREEN_MARGIN));
    }

    @Override
    public double energyBoundKWh(ScreenValues s) {
        double sum = 0;
        for (int i = 0; i < flowRunners.length; i++) {
            sum += flowWeights[i] * boundW(s, flowRunners[i]);
        }
        return sum;
    }

    @Override
    public double ratedPowerEstimateW(ScreenValues s) {
        return estimateW(s, designRunner);
    }

    @Override
    public double energyEstimateKWh(ScreenValues s) {
        double sum = 0;
        for (int i = 0; i < flowRunners.length; i++) {
            sum += flowWeights[i] * estimateW(s, flowRunners[i]);
        }
        return sum;
    }

    private double estimateW(ScreenValues s, HydroRunner r) {
        double ratio = drive.driveRatio();
        double eta = drive.drivetrainEfficiency();
        return MatchEstimate.batteryPowerW(s, n -> eta * r.powerW(n / ratio), r.runawaySpeedRpm() * ratio, lc);
    }

    @Override
    public boolean hasEnergy() {
        return drive.site().hasFlowDuration();
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
                    r.runawayAlternatorSpeedRpm(), r.cautions());
        }
        SpeedPoint rated = AlternatorEvaluator.point(alt, load, m.alternatorSpeedRpm());
        return FullEvaluation.of(alt, true, cutIn, 0, rated, r.openCircuitLineRmsVAtRunaway(),
                r.runawayAlternatorSpeedRpm(), r.annualEnergyKWh().orElse(0), r.cautions());
    }
}
