package coilwright.sizing;

import coilwright.load.BatteryLoad;
import coilwright.machine.Alternator;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.SpeedPoint;

import java.util.List;

/** Plain speed targets: the rated point is one operating point of the full model at the rated speed. */
final class SpeedDriveModel implements DriveModel {
    private final SpeedTargets targets;
    private final BatteryLoad load;
    private final LoadConstants lc;

    SpeedDriveModel(SpeedTargets targets, BatteryLoad load, LoadConstants lc) {
        this.targets = targets;
        this.load = load;
        this.lc = lc;
    }

    @Override
    public LoadConstants constants() {
        return lc;
    }

    @Override
    public double checkSpeedRpm() {
        return targets.effectiveMaxSpeedRpm();
    }

    @Override
    public String checkSpeedSource() {
        return targets.maxSpeedRpm() > 0 ? "the maximum speed given" : "twice the rated speed, as no maximum was given";
    }

    @Override
    public double highestCutInRpm() {
        return targets.cutInSpeedRpm();
    }

    /**
     * At the rated speed the line current is at least what the EMF drives past the bridge's voltage
     * ({@link BridgeBounds#minLineCurrentRmsA}); a design that meets the rated power also carries at least P / V_b
     * into the battery, so a line current of at least that / sqrt(2).
     */
    @Override
    public double ratedLineCurrentFloorA(ScreenValues s) {
        return Math.max(BridgeBounds.lineCurrentFromDcA(powerFloorA()), s.minLineCurrentA(targets.ratedSpeedRpm(), lc));
    }

    private double powerFloorA() {
        return targets.ratedPowerW() / lc.batteryV();
    }

    @Override
    public double ratedEfficiencyBound(ScreenValues s) {
        double rated = targets.ratedSpeedRpm();
        return BridgeBounds.maxEfficiency(lc.batteryV(), lc.thresholdV(), s.lineOhm, lc.dcSideOhm(), powerFloorA(),
                s.maxDcCurrentA(rated, lc), s.minLineCurrentA(rated, lc));
    }

    @Override
    public double ratedPowerBoundW(ScreenValues s) {
        return lc.batteryV() * s.maxDcCurrentA(targets.ratedSpeedRpm(), lc);
    }

    @Override
    public double energyBoundKWh(ScreenValues s) {
        return 0;
    }

    @Override
    public double ratedPowerEstimateW(ScreenValues s) {
        return lc.batteryV() * MatchEstimate.dcCurrentA(s, targets.ratedSpeedRpm(), lc);
    }

    @Override
    public double energyEstimateKWh(ScreenValues s) {
        return 0;
    }

    @Override
    public boolean hasEnergy() {
        return false;
    }

    @Override
    public List<Limit> limits() {
        return List.of(
                FigureLimit.atMost("cutInSpeed", "drive.cutInSpeedRpm", "rpm", targets.cutInSpeedRpm(),
                        "starts charging at or below %.0f rpm", s -> s.cutInRpm, FullEvaluation::cutInSpeedRpm),
                FigureLimit.atLeast("ratedPower", "drive.ratedPowerW", "W", targets.ratedPowerW(),
                        "delivers at least %.0f W at " + Math.round(targets.ratedSpeedRpm()) + " rpm",
                        this::ratedPowerBoundW, FullEvaluation::ratedPowerW));
    }

    @Override
    public FullEvaluation evaluate(Alternator alt) {
        double rated = targets.ratedSpeedRpm();
        SpeedPoint p = AlternatorEvaluator.point(alt, load, rated);
        double cutIn = AlternatorEvaluator.closedFormCutInRpm(alt, load);
        return FullEvaluation.of(alt, p.powerToLoadW() > 0, cutIn, 0, p, alt.emfLineRmsV(checkSpeedRpm()),
                checkSpeedRpm(), 0, AlternatorEvaluator.cautionsAt(alt, load, checkSpeedRpm(), checkSpeedSource(), p.powerToLoadW(),
                        p.dcCurrentA()));
    }
}
