package coilwright.winding;

import coilwright.validation.InfeasibleDesignException;
import org.apache.commons.math3.util.ArithmeticUtils;

import java.util.Locale;

/**
 * The closed-form conditions for a balanced winding, checked before the layout so the refusal can give the
 * numbers. Double layer: Q/(m*t) whole, t = gcd(Q, p) (Bianchi and Dai Pre, 2006). Single layer with an odd
 * pitch: Q even and the star of the Q/2 coil phasors balanced, (Q/2)/(m*t') whole with t' = gcd(Q/2, p); with an
 * even pitch the coil must span 180 electrical degrees and the slot star must meet the double-layer condition.
 * The layout is checked numerically afterwards as well.
 */
final class Feasibility {
    private Feasibility() {
    }

    /**
     * The coil pitch used: the requested one, else 1 where q &lt; 1 (tooth coils), else the full pitch
     * round(Q/2p); for a single layer whose full pitch is not a whole number of slots, the nearest odd pitch.
     */
    static int resolvePitch(WindingSpec s) {
        if (s.coilPitchSlots() > 0) {
            return s.coilPitchSlots();
        }
        int maxPitch = Math.max(1, s.slots() / 2);
        if (s.slots() < s.poles() * s.phases()) {
            return 1;
        }
        double full = (double) s.slots() / s.poles();
        int pitch = (int) Math.round(full);
        if (s.layers() == Layers.SINGLE && s.slots() % s.poles() != 0) {
            int below = 2 * (int) Math.floor((full - 1) / 2) + 1;
            pitch = full - below <= below + 2 - full ? below : below + 2;
        }
        return Math.min(maxPitch, Math.max(1, pitch));
    }

    /** @throws InfeasibleDesignException (field {@code slots} or {@code coilPitchSlots}) with the reason */
    static void requireBalanceable(WindingSpec s, int pitch) {
        int q = s.slots();
        int p = s.polePairs();
        int m = s.phases();
        int t = ArithmeticUtils.gcd(q, p);
        String what = describe(s);
        if (s.layers() == Layers.SINGLE) {
            if (q % 2 != 0) {
                throw new InfeasibleDesignException("slots", what + ": a single-layer winding needs an even number"
                        + " of slots (each coil has two slots of its own); use a double layer or an even slot count");
            }
            if (pitch % 2 == 0) {
                if (Math.floorMod(2L * pitch * p, 2L * q) != q) {
                    throw new InfeasibleDesignException("coilPitchSlots", String.format(Locale.ROOT,
                            "%s: a single-layer coil with an even pitch must span exactly 180 electrical degrees;"
                                    + " a pitch of %d slots spans %.1f degrees. Use an odd pitch or a double layer",
                            what, pitch, pitch * 360.0 * p / q));
                }
            } else {
                int half = q / 2;
                int tHalf = ArithmeticUtils.gcd(half, p);
                if (half % (m * tHalf) != 0) {
                    throw new InfeasibleDesignException("slots", String.format(Locale.ROOT,
                            "%s, single layer: (Q/2)/(m*t') = %d/(%d*%d) is not a whole number (t' = gcd(Q/2, p)),"
                                    + " so the phases cannot be balanced", what, half, m, tHalf));
                }
                return;
            }
        }
        if (q % (m * t) != 0) {
            throw new InfeasibleDesignException("slots", String.format(Locale.ROOT,
                    "%s: Q/(m*t) = %d/(%d*%d) is not a whole number (t = gcd(Q, p) = %d), so the phases cannot be"
                            + " balanced", what, q, m, t, t));
        }
    }

    static String describe(WindingSpec s) {
        return s.slots() + " slots with " + s.poles() + " poles and " + s.phases()
                + (s.phases() == 1 ? " phase" : " phases");
    }
}
