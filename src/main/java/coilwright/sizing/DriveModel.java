package coilwright.sizing;

import coilwright.machine.Alternator;

import java.util.List;

/**
 * A drive as the search sees it: the speeds that matter, the closed-form bounds of what a candidate can deliver,
 * the drive's own limits, and the full evaluation of one built alternator.
 */
interface DriveModel {

    /** Alternator speed at which the open-circuit voltage is checked, rpm. */
    double checkSpeedRpm();

    /** Where that speed comes from, in words. */
    String checkSpeedSource();

    /** The highest cut-in speed a design may have and still meet the drive's limits, rpm. */
    double highestCutInRpm();

    /** The load's constants the bounds use. */
    LoadConstants constants();

    /**
     * A lower bound of the rms line current at the rated point of a candidate that meets the drive's own limits, A;
     * none is known (0) where the rated speed is not fixed in advance.
     */
    default double ratedLineCurrentFloorA(ScreenValues s) {
        return 0;
    }

    /**
     * An upper bound of the efficiency at the rated point of a candidate that meets the drive's own limits; where the
     * rated speed is not fixed in advance only the diodes are certain to take their share, V_b / (V_b + 2 V_d).
     */
    default double ratedEfficiencyBound(ScreenValues s) {
        return constants().batteryV() / constants().thresholdV();
    }

    /**
     * An upper bound of the alternator's shaft torque at the rated point, N m; infinite where none is known. Where
     * the rated point is matched to a turbine, the shaft takes at most the turbine's largest power above the cut-in
     * speed, and turns at least at the cut-in speed whenever current flows (with none flowing the torque is 0).
     */
    default double ratedShaftTorqueBoundNm(ScreenValues s) {
        return Double.POSITIVE_INFINITY;
    }

    /** Shaft torque at most a shaft power can give at or above a speed, N m, widened for rounding. */
    static double torqueBoundNm(double shaftPowerBoundW, double lowestSpeedRpm) {
        if (lowestSpeedRpm <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        return shaftPowerBoundW / (lowestSpeedRpm * Math.PI / 30) * (1 + Scoring.WIDENING) + 1e-12;
    }

    /** An upper bound of the power into the battery at the rated point, W. */
    double ratedPowerBoundW(ScreenValues s);

    /** An upper bound of the annual energy into the battery, kWh; 0 when the drive gives no annual energy. */
    double energyBoundKWh(ScreenValues s);

    /** An estimate of the power into the battery at the rated point, W: for the order of refinement only. */
    double ratedPowerEstimateW(ScreenValues s);

    /** An estimate of the annual energy, kWh (0 without one): for the order of refinement only. */
    double energyEstimateKWh(ScreenValues s);

    /** True when the drive gives an annual energy. */
    boolean hasEnergy();

    /** The drive's own limits (cut-in, charging, rated power). */
    List<Limit> limits();

    /** The candidate under the full model. */
    FullEvaluation evaluate(Alternator alt);

    static DriveModel of(SizingRequest req, LoadConstants lc) {
        if (req.drive() instanceof WindDrive w) {
            return new WindDriveModel(w, req.load(), lc, req.limits().maxCutInWindSpeedMs());
        }
        if (req.drive() instanceof HydroDrive h) {
            return new HydroDriveModel(h, req.load(), lc);
        }
        return new SpeedDriveModel((SpeedTargets) req.drive(), req.load(), lc);
    }
}
