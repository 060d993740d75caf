package coilwright.load;

/**
 * Rectifier diode family with a typical forward drop at rated current.
 * Values are from memory of typical power-diode datasheets (silicon PN about 0.7-1.0 V, Schottky about
 * 0.4-0.55 V near rated current); a measured or datasheet drop can always be entered instead.
 */
public enum DiodeType {
    /** Silicon PN power diode, typical forward drop 0.8 V (from memory, typical datasheets). */
    SILICON(0.8),
    /** Schottky barrier diode, typical forward drop 0.45 V (from memory, typical datasheets). */
    SCHOTTKY(0.45);

    private final double typicalForwardDropV;

    DiodeType(double typicalForwardDropV) {
        this.typicalForwardDropV = typicalForwardDropV;
    }

    /** Typical forward drop in volts at rated current. */
    public double typicalForwardDropV() {
        return typicalForwardDropV;
    }
}
