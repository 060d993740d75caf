package coilwright.load;

import coilwright.validation.Checks;

/**
 * The circuit a diode bridge solver sees, in per-branch values.
 * Three-phase: the source is the equivalent star (phase EMF, resistance and inductance per star phase) and
 * the AC cable resistance is per line. Single-phase: the winding's own EMF, resistance and inductance, and the
 * AC cable resistance of one of its two conductors. The DC side is the battery voltage behind the DC cable
 * loop resistance and the battery's internal resistance; DC-side inductance is taken as zero.
 *
 * @param type                         THREE_PHASE_BRIDGE or SINGLE_PHASE_BRIDGE
 * @param emfPhaseRmsV                 EMF, V rms, 0 to 1e6
 * @param frequencyHz                  electrical frequency, > 0 and <= 1e5 Hz
 * @param windingResistanceOhm         winding resistance, 0 to 1e4 Ohm
 * @param acCableResistanceOhm         AC cable resistance per conductor, 0 to 1e4 Ohm (with the winding: > 0)
 * @param inductanceH                  winding inductance, > 0 and <= 100 H
 * @param batteryVoltageV              battery voltage, > 0 and <= 2000 V
 * @param diodeDropV                   forward drop of one diode, 0 to 5 V
 * @param dcCableResistanceOhm         DC cable loop resistance, 0 to 1e4 Ohm
 * @param batteryInternalResistanceOhm battery internal resistance, 0 to 100 Ohm
 */
public record BridgeCircuit(BridgeType type, double emfPhaseRmsV, double frequencyHz, double windingResistanceOhm,
                            double acCableResistanceOhm, double inductanceH, double batteryVoltageV,
                            double diodeDropV, double dcCableResistanceOhm, double batteryInternalResistanceOhm) {
    public BridgeCircuit {
        if (!plainlyValid(type, emfPhaseRmsV, frequencyHz, windingResistanceOhm, acCableResistanceOhm, inductanceH,
                batteryVoltageV, diodeDropV, dcCableResistanceOhm, batteryInternalResistanceOhm)) {
            Checks c = new Checks();
            c.present("type", type)
                    .range("emfPhaseRmsV", emfPhaseRmsV, 0, 1e6)
                    .rangeExclusiveMin("frequencyHz", frequencyHz, 0, 1e5)
                    .range("windingResistanceOhm", windingResistanceOhm, 0, 1e4)
                    .range("acCableResistanceOhm", acCableResistanceOhm, 0, 1e4)
                    .rangeExclusiveMin("inductanceH", inductanceH, 0, 100)
                    .rangeExclusiveMin("batteryVoltageV", batteryVoltageV, 0, 2000)
                    .range("diodeDropV", diodeDropV, 0, 5)
                    .range("dcCableResistanceOhm", dcCableResistanceOhm, 0, 1e4)
                    .range("batteryInternalResistanceOhm", batteryInternalResistanceOhm, 0, 100);
            if (!c.hasErrors()) {
                c.require(windingResistanceOhm + acCableResistanceOhm > 0, "windingResistanceOhm",
                        windingResistanceOhm, "winding plus AC cable resistance must be > 0", "> 0 with the cable");
            }
            c.throwIfAny();
        }
    }

    /**
     * The same rules as the checks above, as plain comparisons (false for NaN): a sweep builds one circuit per
     * speed, and the checks format their messages eagerly, so they run only when something is wrong.
     */
    private static boolean plainlyValid(BridgeType type, double emf, double f, double rw, double rc, double l,
                                        double vb, double vd, double rdc, double rb) {
        return type != null && in(emf, 0, 1e6) && f > 0 && f <= 1e5 && in(rw, 0, 1e4) && in(rc, 0, 1e4)
                && l > 0 && l <= 100 && vb > 0 && vb <= 2000 && in(vd, 0, 5) && in(rdc, 0, 1e4) && in(rb, 0, 100)
                && rw + rc > 0;
    }

    private static boolean in(double v, double min, double max) {
        return v >= min && v <= max;
    }

    /** Peak line-to-line EMF (three-phase) or peak winding EMF (single-phase), V. */
    public double peakDrivingEmfV() {
        double k = type == BridgeType.THREE_PHASE_BRIDGE ? Math.sqrt(3) : 1;
        return Math.sqrt(2) * k * emfPhaseRmsV;
    }

    /** Battery voltage plus two diode drops, V: the peak EMF must exceed this for any current. */
    public double thresholdV() {
        return batteryVoltageV + 2 * diodeDropV;
    }

    /** DC-side series resistance: DC cable loop plus battery internal resistance, Ohm. */
    public double dcResistanceOhm() {
        return dcCableResistanceOhm + batteryInternalResistanceOhm;
    }
}
