package coilwright.load;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

import java.util.ArrayList;
import java.util.List;

/** Period averages of a periodic bridge solution, integrated exactly segment by segment. */
final class BridgeResults {
    /** Sampling step for peak search before refinement, electrical radians. */
    private static final double PEAK_SAMPLE_RAD = Math.toRadians(2.0);

    private BridgeResults() {
    }

    static BridgeOperatingPoint belowCutIn(BridgeCircuit c) {
        double vll = c.type() == BridgeType.THREE_PHASE_BRIDGE ? Math.sqrt(3) * c.emfPhaseRmsV() : c.emfPhaseRmsV();
        return new BridgeOperatingPoint(ConductionMode.ZERO_BELOW_CUT_IN, 0, 0, c.batteryVoltageV(),
                c.batteryVoltageV(), 0, 0, 0, vll, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    static BridgeOperatingPoint assemble(BridgeCircuit c, BridgeModel md, BridgeSweep sw) {
        double sumI2 = 0;
        double emfPower = 0;
        double qIdc = 0;
        double qIdc2 = 0;
        double vll2 = 0;
        double conductingTime = 0;
        double overlapTime = 0;
        double offTime = 0;
        for (int i = 0; i < sw.segments.size(); i++) {
            BridgeSegment s = sw.segments.get(i);
            double d = sw.durations.get(i);
            BasisIntegrals bi = new BasisIntegrals(s, d);
            BridgePulse pulse = sw.pulses.get(i);
            if (pulse != null) {
                sumI2 += 2 * pulse.squareA2s;
                emfPower += pulse.emfEnergyJ;
                qIdc += pulse.chargeC;
                qIdc2 += pulse.squareA2s;
            } else {
                for (int k = 0; k < md.m; k++) {
                    if (s.sign[k] != 0) {
                        sumI2 += bi.product(s.current[k], s.current[k]);
                        emfPower += bi.product(s.emf(k), s.current[k]);
                    }
                }
                double[] idc = s.dcCurrent();
                qIdc += bi.integral(idc);
                qIdc2 += bi.product(idc, idc);
            }
            for (int[] pair : pairs(md.m)) {
                double[] v = minus(s.terminal(pair[0]), s.terminal(pair[1]));
                vll2 += bi.product(v, v);
            }
            conductingTime += s.conducting() * d;
            overlapTime += s.conducting() == 3 ? d : 0;
            offTime += s.off() ? d : 0;
        }
        double ts = md.sweepS;
        double idcAvg = qIdc / ts;
        double idcRms2 = Math.max(qIdc2 / ts, 0);
        double i2 = Math.max(sumI2 / ts, 0);
        double vb = c.batteryVoltageV();
        boolean three = md.m == 3;
        ConductionMode mode = offTime > 0 ? ConductionMode.DISCONTINUOUS
                : three ? ConductionMode.CONTINUOUS_WITH_OVERLAP : ConductionMode.CONTINUOUS;
        double perDiodeFactor = three ? 1 : 0.5;
        return new BridgeOperatingPoint(mode, idcAvg, Math.sqrt(idcRms2), vb, vb + c.dcResistanceOhm() * idcAvg,
                Math.sqrt(i2 / md.m), peak(md, sw, false), three ? peak(md, sw, true) : peak(md, sw, false),
                Math.sqrt(Math.max(vll2, 0) / (pairs(md.m).size() * ts)), emfPower / ts, vb * idcAvg,
                md.rWinding * i2, md.rCable * i2, c.dcCableResistanceOhm() * idcRms2,
                c.batteryInternalResistanceOhm() * idcRms2, 2 * c.diodeDropV() * idcAvg,
                Math.toDegrees(conductingTime * md.w) * perDiodeFactor, Math.toDegrees(overlapTime * md.w));
    }

    private static List<int[]> pairs(int m) {
        return m == 3 ? List.of(new int[] {0, 1}, new int[] {1, 2}, new int[] {2, 0}) : List.<int[]>of(new int[] {0, 1});
    }

    private static double[] minus(double[] p, double[] q) {
        double[] r = new double[p.length];
        for (int i = 0; i < p.length; i++) {
            r[i] = p[i] - q[i];
        }
        return r;
    }

    /** Peak of |i_k| (line currents) or of |i_j - i_k|/3 (delta winding currents) over the sweep. */
    private static double peak(BridgeModel md, BridgeSweep sw, boolean delta) {
        double best = 0;
        BridgeSegment bestSeg = null;
        double[] bestFn = null;
        double bestTau = 0;
        double bestD = 0;
        double[] bs = new double[BridgeSegment.NB];
        for (int i = 0; i < sw.segments.size(); i++) {
            BridgeSegment s = sw.segments.get(i);
            double d = sw.durations.get(i);
            if (s.off()) {
                continue;
            }
            BridgePulse pulse = sw.pulses.get(i);
            if (pulse != null) {
                // line currents +i and -i: the largest delta combination is (i - (-i)) / 3
                best = Math.max(best, delta && md.m == 3 ? 2 * pulse.peakA / 3 : pulse.peakA);
                continue;
            }
            List<double[]> fns = new ArrayList<>();
            if (delta) {
                for (int[] p : pairs(md.m)) {
                    double[] f = minus(s.current[p[0]], s.current[p[1]]);
                    for (int j = 0; j < f.length; j++) {
                        f[j] /= 3;
                    }
                    fns.add(f);
                }
            } else {
                fns.addAll(List.of(s.current));
            }
            int samples = Math.max(2, (int) Math.ceil(d * md.w / PEAK_SAMPLE_RAD));
            for (int j = 0; j <= samples; j++) {
                double tau = d * j / samples;
                s.basis(tau, bs);
                for (double[] f : fns) {
                    double v = Math.abs(BridgeSegment.dot(f, bs));
                    if (v > best) {
                        best = v;
                        bestSeg = s;
                        bestFn = f;
                        bestTau = tau;
                        bestD = d;
                    }
                }
            }
        }
        if (bestSeg == null) {
            return best;
        }
        double step = PEAK_SAMPLE_RAD / md.w;
        double lo = Math.max(0, bestTau - step);
        double hi = Math.min(bestD, bestTau + step);
        if (hi <= lo) {
            return best;
        }
        BridgeSegment seg = bestSeg;
        double[] fn = bestFn;
        double[] b2 = new double[BridgeSegment.NB];
        double refined = new BrentOptimizer(1e-12, 1e-14 * step).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(tau -> {
                    seg.basis(tau, b2);
                    return Math.abs(BridgeSegment.dot(fn, b2));
                }), GoalType.MAXIMIZE, new SearchInterval(lo, hi, Math.min(hi, Math.max(lo, bestTau)))).getValue();
        return Math.max(best, refined);
    }
}
