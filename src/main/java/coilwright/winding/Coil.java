package coilwright.winding;

/**
 * One coil of a winding layout.
 *
 * @param number     coil number, 1-based, in the order of the go slots
 * @param goSlot     slot (1..Q) holding the coil's start side
 * @param returnSlot slot (1..Q) holding the return side: goSlot + pitch, wrapped round Q
 * @param phase      phase index 0..m-1 (A, B, C, ...)
 * @param polarity   +1 when the coil is connected forward in its phase (start to the phase's start side),
 *                   -1 when it is connected reversed
 */
public record Coil(int number, int goSlot, int returnSlot, int phase, int polarity) {
    public Coil {
        if (number < 1 || goSlot < 1 || returnSlot < 1 || phase < 0 || (polarity != 1 && polarity != -1)) {
            throw new IllegalArgumentException("inconsistent coil: number " + number + ", slots " + goSlot
                    + "-" + returnSlot + ", phase " + phase + ", polarity " + polarity);
        }
    }

    /** The phase's letter: A, B, C, ... */
    public String phaseName() {
        return Winding.phaseName(phase);
    }

    /** A rewinder's label such as {@code "A"} or {@code "-B"} (reversed coil). */
    public String label() {
        return (polarity < 0 ? "-" : "") + phaseName();
    }
}
