package coilwright.conductor;

/**
 * How a winding is cooled, with the band of rms current density its copper is commonly designed for.
 * The bands are design guidance, not limits of a standard: values from memory of the tables of typical
 * current densities in Pyrhonen, Jokinen &amp; Hrabovcova, "Design of Rotating Electrical Machines" (2008),
 * chapter 6, and common practice for small generators; the air-cored band is common practice.
 */
public enum Cooling {
    /** Totally enclosed, no fan: 2 to 4 A/mm^2 (from memory). */
    ENCLOSED_NATURAL(2.0, 4.0),
    /** Open, self-ventilated frame: 4 to 6 A/mm^2 (from memory). */
    OPEN_VENTILATED(4.0, 6.0),
    /** Resin-cast air-cored coils in a disc stator, cooled by the air the rotor discs move: 3 to 5 A/mm^2 (common practice). */
    AIR_COOLED_AXIAL_OPEN_COIL(3.0, 5.0),
    /** Forced air from a separate fan: 5 to 10 A/mm^2 (from memory). */
    FORCED_AIR(5.0, 10.0),
    /** Liquid-cooled stator: 10 to 20 A/mm^2 (from memory). */
    LIQUID(10.0, 20.0);

    private final double lowAPerMm2;
    private final double highAPerMm2;

    Cooling(double lowAPerMm2, double highAPerMm2) {
        this.lowAPerMm2 = lowAPerMm2;
        this.highAPerMm2 = highAPerMm2;
    }

    /** Lower end of the usual band, A/mm^2. */
    public double lowAPerMm2() {
        return lowAPerMm2;
    }

    /** Upper end of the usual band, A/mm^2: above it the winding is likely to run too hot. */
    public double highAPerMm2() {
        return highAPerMm2;
    }
}
