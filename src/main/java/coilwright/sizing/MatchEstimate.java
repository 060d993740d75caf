package coilwright.sizing;

import java.util.function.DoubleUnaryOperator;

/**
 * A quick estimate of where a turbine and a candidate settle, to refine the most promising candidates first. Not a
 * bound: the ranking's proof uses the bounds only. The bridge is the average six-pulse rectifier with commutation
 * reactance and resistance, V_dc = 1.35 E_LL - (3/pi) X I_dc - 2 R I_dc (e.g. Mohan, Undeland &amp; Robbins, "Power
 * Electronics", ch. 5), which is rough near cut-in; the turbine is matched by bisection on the power balance.
 */
final class MatchEstimate {
    /** Halvings of the speed bracket: 1/256 of it (a rpm or two) is finer than the estimate's own accuracy. */
    private static final int HALVINGS = 8;

    private MatchEstimate() {
    }

    /** Estimated average DC current at a speed, A. */
    static double dcCurrentA(ScreenValues s, double speedRpm, LoadConstants lc) {
        double reactanceOhm = 2 * Math.PI * s.polePairs * speedRpm / 60 * s.starInductanceH;
        double drive = 1.35 * s.keLineVPerRpm * speedRpm - lc.thresholdV();
        return drive <= 0 ? 0 : drive / (2 * s.lineOhm + lc.dcSideOhm() + 3 / Math.PI * reactanceOhm);
    }

    /** Estimated power the alternator takes at its shaft at a speed, W. */
    static double shaftPowerW(ScreenValues s, double speedRpm, LoadConstants lc) {
        double d = dcCurrentA(s, speedRpm, lc);
        return lc.thresholdV() * d + (2 * s.lineOhm + lc.dcSideOhm()) * d * d;
    }

    /**
     * Estimated battery power where the turbine settles between the cut-in speed and its top speed, W.
     *
     * @param turbineShaftW power the turbine offers at the alternator shaft, by alternator speed (rpm to W)
     * @param topRpm        the highest alternator speed the turbine reaches, rpm
     */
    static double batteryPowerW(ScreenValues s, DoubleUnaryOperator turbineShaftW, double topRpm, LoadConstants lc) {
        if (topRpm <= s.cutInRpm) {
            return 0;
        }
        return lc.batteryV() * dcCurrentA(s, matchRpm(s, turbineShaftW, s.cutInRpm, topRpm, lc), lc);
    }

    /**
     * Estimated speed in [fromRpm, topRpm] where the alternator takes what the turbine gives; the top speed when it
     * never does, rpm.
     */
    static double matchRpm(ScreenValues s, DoubleUnaryOperator turbineShaftW, double fromRpm, double topRpm,
                           LoadConstants lc) {
        double lo = fromRpm;
        double hi = topRpm;
        if (shaftPowerW(s, hi, lc) < turbineShaftW.applyAsDouble(hi)) {
            return hi;
        }
        for (int k = 0; k < HALVINGS; k++) {
            double mid = 0.5 * (lo + hi);
            if (shaftPowerW(s, mid, lc) < turbineShaftW.applyAsDouble(mid)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
