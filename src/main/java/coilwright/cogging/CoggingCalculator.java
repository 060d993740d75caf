package coilwright.cogging;

import coilwright.magnet.RotorSide;
import org.apache.commons.math3.util.ArithmeticUtils;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Cogging torque of slotted surface-magnet machines from the no-load field of {@link SubdomainField} (the subdomain
 * model of Zhu, Wu, Xia &amp; Howe, IEEE Trans. Magn. 46(4), 2010, in Cartesian form): the tangential Maxwell stress
 * in the middle of the gap over one periodic section (t = gcd(Q, p) sections per machine), at
 * {@link #POSITIONS_PER_PERIOD} rotor positions across one cogging period 360 / LCM(Q, 2p) degrees, resolved into
 * harmonics of LCM(Q, 2p) cycles per revolution. Skewing the magnets or slots by theta_sk along the stack averages
 * each harmonic k over the skew: its amplitude is multiplied by sin(k theta_sk / 2) / (k theta_sk / 2) (Zhu &amp; Howe,
 * IEEE Trans. Energy Convers. 15(4), 2000). Iron is infinitely permeable and linear, slots are deep and parallel at
 * the opening; saturation, tooth-tip shape and manufacturing tolerances are not modelled (tolerances alone often add
 * cogging at other orders in real machines, so a computed near-zero is a lower bound).
 */
public final class CoggingCalculator {
    /** Rotor positions computed over one cogging period. */
    static final int POSITIONS_PER_PERIOD = 48;
    /** Harmonics of LCM(Q, 2p) kept. */
    static final int HARMONICS = 12;
    /** Samples of the torque over one period when finding its extremes. */
    static final int WAVEFORM_SAMPLES = 720;
    /** The method in words. */
    public static final String METHOD = "subdomain field model (Zhu, Wu, Xia & Howe 2010, Cartesian form) with the "
            + "Maxwell stress in the air gap; skew factor on each harmonic";

    /** Recently computed machines: cogging depends on geometry and magnets only, which a design session rarely
     * changes while turns, wire, battery and speeds change on every request. Bounded, least recently used first out. */
    private static final int REMEMBERED = 256;
    private static final Map<CoggingInput, CoggingTorque> RECENT = Collections.synchronizedMap(
            new LinkedHashMap<>(64, 0.75f, true) {
                @Override
                protected boolean removeEldestEntry(Map.Entry<CoggingInput, CoggingTorque> eldest) {
                    return size() > REMEMBERED;
                }
            });

    private CoggingCalculator() {
    }

    /** The field model of one periodic section (t = gcd(Q, p) sections per machine). */
    static SubdomainField field(CoggingInput in) {
        int t = ArithmeticUtils.gcd(in.slots(), in.poles() / 2);
        return new SubdomainField(in.slots() / t, in.poles() / t, 2 * Math.PI * midGapRadiusM(in) / t,
                in.slotOpeningM(), in.airGapM(), in.magnetThicknessM(), in.poleArcRatio(), in.remanenceT(),
                in.recoilPermeability());
    }

    /**
     * Cogging torque without skew at a rotor angle from the position where a pole centre faces a slot centre, N m.
     */
    static double unskewedTorqueNm(CoggingInput in, SubdomainField field, double rotorAngleRad) {
        int t = ArithmeticUtils.gcd(in.slots(), in.poles() / 2);
        double r = midGapRadiusM(in);
        return -field.forcePerDepth(rotorAngleRad * r) * r * in.stackLengthM() * t;
    }

    private static double midGapRadiusM(CoggingInput in) {
        return in.gapDiameterM() / 2 + (in.side() == RotorSide.INNER ? -1 : 1) * in.airGapM() / 2;
    }

    /** An air-cored stator: no teeth, so no cogging. */
    public static CoggingTorque airCored() {
        return CoggingTorque.none("air-cored stator: there are no iron teeth for the magnets to align with, so "
                + "there is no cogging torque");
    }

    /** Cogging of a slotted surface-magnet machine; the same input gives the same (immutable) answer, remembered. */
    public static CoggingTorque radial(CoggingInput in) {
        CoggingTorque known = RECENT.get(in);
        if (known != null) {
            return known;
        }
        CoggingTorque computed = computeRadial(in);
        RECENT.put(in, computed);
        return computed;
    }

    private static CoggingTorque computeRadial(CoggingInput in) {
        int q = in.slots();
        int lcm = ArithmeticUtils.lcm(q, in.poles());
        if (in.slotOpeningM() == 0) {
            return CoggingTorque.none("closed slots (zero slot opening): the stator surface facing the magnets is "
                    + "smooth, so there is no cogging torque in this model");
        }
        SubdomainField field = field(in);
        double[] torque = new double[POSITIONS_PER_PERIOD];
        for (int i = 0; i < POSITIONS_PER_PERIOD; i++) {
            torque[i] = unskewedTorqueNm(in, field, 2 * Math.PI / lcm * i / POSITIONS_PER_PERIOD);
        }
        double skewRad = in.skewSlotPitches() * 2 * Math.PI / q;
        List<CoggingHarmonic> harmonics = new ArrayList<>();
        for (int h = 1; h <= Math.min(HARMONICS, POSITIONS_PER_PERIOD / 2 - 1); h++) {
            double sine = 0;
            for (int i = 0; i < POSITIONS_PER_PERIOD; i++) {
                sine += torque[i] * Math.sin(2 * Math.PI * h * i / POSITIONS_PER_PERIOD);
            }
            sine *= 2.0 / POSITIONS_PER_PERIOD;
            int k = h * lcm;
            double x = k * skewRad / 2;
            double skew = x == 0 ? 1 : Math.sin(x) / x;
            harmonics.add(new CoggingHarmonic(k, sine * skew, skew));
        }
        CoggingTorque shape = new CoggingTorque(0, 0, lcm, 360.0 / lcm, harmonics, METHOD);
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < WAVEFORM_SAMPLES; i++) {
            double v = shape.torqueNm(2 * Math.PI / lcm * i / WAVEFORM_SAMPLES);
            max = Math.max(max, v);
            min = Math.min(min, v);
        }
        String note = field.reduced() ? METHOD + "; slot harmonics reduced for the many slots in a section, so the "
                + "figure is rougher than usual" : METHOD;
        return new CoggingTorque(max - min, Math.max(Math.abs(max), Math.abs(min)), lcm, 360.0 / lcm, harmonics,
                note);
    }
}
