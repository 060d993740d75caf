package coilwright.load;

import coilwright.validation.Checks;

/**
 * Cut-in speed of a battery-charging alternator: the speed at which the peak EMF around a current path
 * first equals the battery voltage plus two diode drops (below it the bridge cannot conduct).
 */
public final class CutIn {
    private CutIn() {
    }

    /**
     * Three-phase bridge: sqrt(2) * Ke_LL * n = Vb + 2 Vd, with Ke_LL the line-to-line rms EMF constant.
     * Single-phase bridge: sqrt(2) * Ke_ph * n = Vb + 2 Vd, with Ke_ph the winding's rms EMF constant.
     *
     * @param keLineRmsVPerRpm rms EMF per rpm seen by the bridge (line-to-line for three-phase), > 0 V/rpm
     * @param batteryV         battery voltage, > 0 V
     * @param diodeDropV       forward drop of one diode, >= 0 V
     * @param type             bridge type
     * @return cut-in speed, rpm
     */
    public static double speedRpm(double keLineRmsVPerRpm, double batteryV, double diodeDropV, BridgeType type) {
        new Checks().rangeExclusiveMin("keLineRmsVPerRpm", keLineRmsVPerRpm, 0, 1e6)
                .rangeExclusiveMin("batteryV", batteryV, 0, 2000)
                .range("diodeDropV", diodeDropV, 0, 5)
                .present("type", type)
                .throwIfAny();
        return (batteryV + 2 * diodeDropV) / (Math.sqrt(2) * keLineRmsVPerRpm);
    }
}
