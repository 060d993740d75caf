package coilwright.rewind;

import coilwright.validation.Checks;

/**
 * Closed-form cut-in of a battery charged through a bridge rectifier: charging starts when the peak line
 * EMF exceeds the battery voltage plus two diode drops, sqrt(2) Ke_LL n = Vb + 2 Vd (the ideal bridge
 * conducts through two diodes at a time, three-phase or single-phase; standard rectifier analysis, e.g.
 * Mohan, Undeland and Robbins, Power Electronics, 3rd ed. 2003, ch. 5).
 */
public final class CutInSpeed {
    private CutInSpeed() {
    }

    /**
     * @param keLineRmsVPerRpm line EMF per rpm (rms), V/rpm, &gt; 0
     * @param batteryVoltageV  battery voltage, V, &gt; 0
     * @param diodeDropV       drop of one diode, V, &gt;= 0
     * @return cut-in speed, rpm
     */
    public static double speedRpm(double keLineRmsVPerRpm, double batteryVoltageV, double diodeDropV) {
        new Checks().positive("keLineRmsVPerRpm", keLineRmsVPerRpm).positive("batteryVoltageV", batteryVoltageV)
                .nonNegative("diodeDropV", diodeDropV).throwIfAny();
        return (batteryVoltageV + 2 * diodeDropV) / (Math.sqrt(2) * keLineRmsVPerRpm);
    }

    /**
     * The line constant that cuts in at a given speed.
     *
     * @param cutInSpeedRpm   wanted cut-in, rpm, &gt; 0
     * @param batteryVoltageV battery voltage, V, &gt; 0
     * @param diodeDropV      drop of one diode, V, &gt;= 0
     * @return Ke_LL (rms), V/rpm
     */
    public static double keLineForCutIn(double cutInSpeedRpm, double batteryVoltageV, double diodeDropV) {
        new Checks().positive("cutInSpeedRpm", cutInSpeedRpm).positive("batteryVoltageV", batteryVoltageV)
                .nonNegative("diodeDropV", diodeDropV).throwIfAny();
        return (batteryVoltageV + 2 * diodeDropV) / (Math.sqrt(2) * cutInSpeedRpm);
    }
}
