package coilwright.turbine;

/**
 * Penstock materials with a typical equivalent sand roughness (Moody, Trans. ASME 66, 1944, and
 * White, "Fluid Mechanics", Table 6.1) and a typical Hazen-Williams C for new pipe (common practice).
 * Site-specific or aged pipe may differ: enter the roughness directly when it is known.
 */
public enum PipeMaterial {
    /** PVC: hydraulically smooth, as drawn tubing 0.0015 mm. */
    PVC(0.0015e-3, 150.0, "0.0015 mm"),
    /** HDPE / polyethylene: smooth plastic, taken as drawn tubing 0.0015 mm. */
    HDPE(0.0015e-3, 150.0, "0.0015 mm"),
    /** New commercial steel or wrought iron, 0.045 mm (0.00015 ft). */
    COMMERCIAL_STEEL(0.045e-3, 120.0, "0.045 mm"),
    /** Galvanized iron or steel, 0.15 mm (0.0005 ft). */
    GALVANIZED_STEEL(0.15e-3, 120.0, "0.15 mm"),
    /** Cast iron, 0.26 mm (0.00085 ft). */
    CAST_IRON(0.26e-3, 100.0, "0.26 mm"),
    /** Concrete, 0.3 to 3 mm depending on finish; 1 mm taken as a middle value. */
    CONCRETE(1.0e-3, 130.0, "0.3 to 3 mm");

    private final double roughnessM;
    private final double hazenWilliamsC;
    private final String roughnessRange;

    PipeMaterial(double roughnessM, double hazenWilliamsC, String roughnessRange) {
        this.roughnessM = roughnessM;
        this.hazenWilliamsC = hazenWilliamsC;
        this.roughnessRange = roughnessRange;
    }

    /** Typical equivalent sand roughness, m. */
    public double roughnessM() {
        return roughnessM;
    }

    /** Typical Hazen-Williams coefficient for new pipe. */
    public double hazenWilliamsC() {
        return hazenWilliamsC;
    }

    /** The published roughness value or range, as text. */
    public String roughnessRange() {
        return roughnessRange;
    }
}
