package coilwright.load;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

import java.util.List;

/** Period averages of a periodic bridge solution, integrated exactly segment by segment. */
final class BridgeResults {
    /** Sampling step for peak search before refinement, electrical radians. */
    private static final double PEAK_SAMPLE_RAD = Math.toRadians(2.0);
    /**
     * Segment maxima sampled within this fraction of the best sample are refined: a 2-degree grid can misjudge a
     * smooth maximum by about (1 degree)^2 / 2 = 1.5e-4 of it.
     */
    private static final double PEAK_MARGIN = 1e-3;

    private BridgeResults() {
    }

    static BridgeOperatingPoint belowCutIn(BridgeCircuit c) {
        double vll = c.type() == BridgeType.THREE_PHASE_BRIDGE ? Math.sqrt(3) * c.emfPhaseRmsV() : c.emfPhaseRmsV();
        return new BridgeOperatingPoint(ConductionMode.ZERO_BELOW_CUT_IN, 0, 0, c.batteryVoltageV(),
                c.batteryVoltageV(), 0, 0, 0, vll, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    static BridgeOperatingPoint assemble(BridgeCircuit c, BridgeModel model, SymmetryIntervalTrace trace) {
        double sumI2 = 0;
        double emfPower = 0;
        double qIdc = 0;
        double qIdc2 = 0;
        double vll2 = 0;
        double conductingTime = 0;
        double overlapTime = 0;
        double offTime = 0;
        for (int i = 0; i < trace.segments.size(); i++) {
            BridgeSegment s = trace.segments.get(i);
            double d = trace.durations.get(i);
            BasisIntegrals bi = new BasisIntegrals(s, d);
            BridgePulse pulse = trace.pulses.get(i);
            if (pulse != null) {
                sumI2 += 2 * pulse.squareA2s;
                emfPower += pulse.emfEnergyJ;
                qIdc += pulse.chargeC;
                qIdc2 += pulse.squareA2s;
            } else {
                for (int k = 0; k < model.branches; k++) {
                    if (s.sign[k] != 0) {
                        sumI2 += bi.product(s.current[k], s.current[k]);
                        emfPower += bi.product(s.emf(k), s.current[k]);
                    }
                }
                double[] idc = s.dcCurrent();
                qIdc += bi.integral(idc);
                qIdc2 += bi.product(idc, idc);
            }
            for (int[] pair : pairs(model.branches)) {
                double[] v = minus(s.terminal(pair[0]), s.terminal(pair[1]));
                vll2 += bi.product(v, v);
            }
            conductingTime += s.conducting() * d;
            overlapTime += s.conducting() == 3 ? d : 0;
            offTime += s.off() ? d : 0;
        }
        double ts = model.intervalS;
        double idcAvg = qIdc / ts;
        double idcRms2 = Math.max(qIdc2 / ts, 0);
        double i2 = Math.max(sumI2 / ts, 0);
        double vb = c.batteryVoltageV();
        boolean three = model.branches == 3;
        ConductionMode mode = offTime > 0 ? ConductionMode.DISCONTINUOUS
                : three ? ConductionMode.CONTINUOUS_WITH_OVERLAP : ConductionMode.CONTINUOUS;
        double perDiodeFactor = three ? 1 : 0.5;
        double linePeak = peak(model, trace, false);
        return new BridgeOperatingPoint(mode, idcAvg, Math.sqrt(idcRms2), vb, vb + c.dcResistanceOhm() * idcAvg,
                Math.sqrt(i2 / model.branches), linePeak, three ? peak(model, trace, true) : linePeak,
                Math.sqrt(Math.max(vll2, 0) / (pairs(model.branches).size() * ts)), emfPower / ts, vb * idcAvg,
                model.windingResistanceOhm * i2, model.cableResistanceOhm * i2, c.dcCableResistanceOhm() * idcRms2,
                c.batteryInternalResistanceOhm() * idcRms2, 2 * c.diodeDropV() * idcAvg,
                Math.toDegrees(conductingTime * model.omega) * perDiodeFactor, Math.toDegrees(overlapTime * model.omega));
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

    /**
     * Peak of |i_k| (line currents) or of |i_j - i_k|/3 (delta winding currents) over the sweep. Every waveform is
     * sampled every {@link #PEAK_SAMPLE_RAD} within each segment (ends included, where kinks are); the best sample
     * of each segment and waveform that comes within {@link #PEAK_MARGIN} of the overall best is refined, so the
     * answer does not depend on where the sweep happens to start.
     */
    private static double peak(BridgeModel model, SymmetryIntervalTrace trace, boolean delta) {
        double best = 0;
        double[] bs = new double[BridgeSegment.NB];
        int nf = delta ? (model.branches == 3 ? 3 : 1) : model.branches;
        int count = trace.segments.size() * nf;
        double[] candValue = new double[count];
        double[] candTau = new double[count];
        double[][] candFn = new double[count][];
        int[] candSeg = new int[count];
        int nc = 0;
        for (int i = 0; i < trace.segments.size(); i++) {
            BridgeSegment s = trace.segments.get(i);
            double d = trace.durations.get(i);
            if (s.off()) {
                continue;
            }
            BridgePulse pulse = trace.pulses.get(i);
            if (pulse != null) {
                // line currents +i and -i: the largest delta combination is (i - (-i)) / 3
                best = Math.max(best, delta && model.branches == 3 ? 2 * pulse.peakA / 3 : pulse.peakA);
                continue;
            }
            int samples = Math.max(2, (int) Math.ceil(d * model.omega / PEAK_SAMPLE_RAD));
            int first = nc;
            for (int f = 0; f < nf; f++) {
                candFn[nc + f] = waveform(model, s, delta, f);
                candValue[nc + f] = -1;
                candSeg[nc + f] = i;
            }
            // basis advanced by recurrence between samples: the samples only choose where to refine exactly
            double h = d / samples;
            double cStep = Math.cos(model.omega * h);
            double sStep = Math.sin(model.omega * h);
            double e1Step = Math.exp(s.lambda1 * h);
            double e2Step = Math.exp(s.lambda2 * h);
            s.basis(0, bs);
            for (int j = 0; j <= samples; j++) {
                double tau = d * j / samples;
                if (j == samples) {
                    s.basis(tau, bs);
                } else if (j > 0) {
                    double c = bs[0] * cStep - bs[1] * sStep;
                    bs[1] = bs[1] * cStep + bs[0] * sStep;
                    bs[0] = c;
                    bs[3] *= e1Step;
                    bs[4] *= e2Step;
                }
                for (int f = 0; f < nf; f++) {
                    double v = Math.abs(BridgeSegment.dot(candFn[first + f], bs));
                    if (v > candValue[first + f]) {
                        candValue[first + f] = v;
                        candTau[first + f] = tau;
                    }
                }
            }
            nc += nf;
        }
        double sampled = best;
        for (int c = 0; c < nc; c++) {
            sampled = Math.max(sampled, candValue[c]);
        }
        best = sampled;
        for (int c = 0; c < nc; c++) {
            if (candValue[c] >= (1 - PEAK_MARGIN) * sampled && candValue[c] > 0) {
                best = Math.max(best, refine(model, trace.segments.get(candSeg[c]), trace.durations.get(candSeg[c]),
                        candFn[c], candTau[c]));
            }
        }
        return best;
    }

    /** Coefficients of waveform f of a segment: line current f, or (i_p - i_q)/3 for the f-th phase pair. */
    private static double[] waveform(BridgeModel model, BridgeSegment s, boolean delta, int f) {
        if (!delta) {
            return s.current[f];
        }
        int[] pair = pairs(model.branches).get(f);
        double[] out = minus(s.current[pair[0]], s.current[pair[1]]);
        for (int j = 0; j < out.length; j++) {
            out[j] /= 3;
        }
        return out;
    }

    /** The maximum of |fn| within one sample step of bestTau in a segment of length d. */
    private static double refine(BridgeModel model, BridgeSegment seg, double d, double[] fn, double bestTau) {
        double step = PEAK_SAMPLE_RAD / model.omega;
        double lo = Math.max(0, bestTau - step);
        double hi = Math.min(d, bestTau + step);
        double[] b2 = new double[BridgeSegment.NB];
        double atBest = Math.abs(value(seg, fn, bestTau, b2));
        if (hi <= lo) {
            return atBest;
        }
        // the peak is where the derivative changes sign from + to -; its root is cheaper to locate than the maximum
        double sgn = Math.signum(value(seg, fn, bestTau, b2));
        double w = model.omega;
        double[] slope = {sgn * w * fn[1], -sgn * w * fn[0], 0, sgn * seg.lambda1 * fn[3], sgn * seg.lambda2 * fn[4]};
        if (value(seg, slope, lo, b2) > 0 && value(seg, slope, hi, b2) < 0) {
            double root = new BrentSolver(1e-15, 1e-14 * step).solve(200, tau -> value(seg, slope, tau, b2), lo, hi);
            return Math.max(atBest, Math.abs(value(seg, fn, root, b2)));
        }
        double refined = new BrentOptimizer(1e-12, 1e-14 * step).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(tau -> Math.abs(value(seg, fn, tau, b2))), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, Math.min(hi, Math.max(lo, bestTau)))).getValue();
        return Math.max(atBest, refined);
    }

    private static double value(BridgeSegment seg, double[] fn, double tau, double[] b) {
        seg.basis(tau, b);
        return BridgeSegment.dot(fn, b);
    }
}
