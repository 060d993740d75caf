package coilwright.sizing;

import coilwright.conductor.Copper;
import coilwright.load.BatteryLoad;

/**
 * The load's constants the closed forms use, worked out once per search.
 *
 * @param batteryV          battery voltage V_b, V
 * @param diodeDropV        forward drop of one diode V_d, V
 * @param thresholdV        V_b + 2 V_d: what the peak line-to-line EMF must exceed to charge, V
 * @param acCableOhm        AC cable resistance per line, Ohm
 * @param dcSideOhm         DC cable loop plus battery internal resistance, Ohm
 * @param copperHotRatio    winding resistance at its working temperature over that at 20 C
 */
record LoadConstants(double batteryV, double diodeDropV, double thresholdV, double acCableOhm, double dcSideOhm,
                     double copperHotRatio) {

    static LoadConstants of(BatteryLoad load, double windingTempC) {
        double vb = load.battery().voltageV();
        double vd = load.rectifier().forwardDropV();
        return new LoadConstants(vb, vd, vb + 2 * vd, load.acCable().lineResistanceOhm(),
                load.dcCable().pairResistanceOhm() + load.battery().internalResistanceOhm(),
                Copper.resistanceRatio(windingTempC));
    }
}
