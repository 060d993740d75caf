package coilwright.load;

/**
 * Ideal average-value factors of diode bridges with no source impedance and no diode drop:
 * Vdc = factor * V (line-to-line rms for three-phase, rms for single-phase).
 * Source: Mohan, Undeland and Robbins, "Power Electronics", 3rd ed., 2003, chapter 5 (diode rectifiers).
 */
public final class BridgeFactors {
    /** Three-phase six-pulse bridge: 3*sqrt(2)/pi = 1.3505. */
    public static final double THREE_PHASE = 3 * Math.sqrt(2) / Math.PI;
    /** Single-phase four-diode bridge: 2*sqrt(2)/pi = 0.9003. */
    public static final double SINGLE_PHASE = 2 * Math.sqrt(2) / Math.PI;

    private BridgeFactors() {
    }

    /** The factor for a bridge type. */
    public static double of(BridgeType type) {
        return type == BridgeType.THREE_PHASE_BRIDGE ? THREE_PHASE : SINGLE_PHASE;
    }
}
