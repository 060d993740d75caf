package coilwright.thermal;

/**
 * Thermal conductivities, W/(m K), of the materials between a winding and the air. Values are typical
 * data-sheet and handbook figures (from memory where no sheet is named); their spread is about +-30 %, which is
 * the largest single uncertainty of the thermal networks.
 */
public final class ThermalMaterials {
    /** Unfilled epoxy or polyester casting resin, 0.2 W/(m K) (resin data sheets, typical 0.17 to 0.25; from memory). */
    public static final double CASTING_RESIN = 0.20;
    /** Casting resin with mineral filler (talc, quartz, alumina trihydrate), 0.5 W/(m K) (0.4 to 1.0; from memory). */
    public static final double FILLED_CASTING_RESIN = 0.50;
    /** Impregnating varnish, 0.2 W/(m K) (from memory). */
    public static final double IMPREGNATING_VARNISH = 0.20;
    /** Aramid-paper or polyester-film slot liner, 0.14 W/(m K) (aramid paper data sheets; from memory). */
    public static final double SLOT_LINER = 0.14;
    /** Non-oriented silicon steel in the plane of the laminations, 28 W/(m K) (from memory; 20 to 40). */
    public static final double LAMINATION_IN_PLANE = 28.0;
    /** Interface gap between stator core and housing, as an equivalent air layer, m: 0.03 mm (Staton, Boglietti
     *  &amp; Cavagnino, IEEE Trans. Energy Convers. 20(3), 2005, give 0.01 to 0.08 mm; from memory). */
    public static final double CORE_TO_HOUSING_GAP_M = 0.03e-3;
    /** Gap between slot liner and laminations, as an equivalent air layer, m: 0.02 mm (from memory). */
    public static final double LINER_TO_IRON_GAP_M = 0.02e-3;
    /** Emissivity of painted metal and cast resin, 0.9 (common practice). */
    public static final double PAINTED_EMISSIVITY = 0.9;

    private ThermalMaterials() {
    }

    /**
     * Conductivity across round wires embedded in a matrix, for heat flowing at right angles to the wires:
     * k = k_m (1 + phi) / (1 - phi), the Maxwell-Garnett (Rayleigh 1892) result for parallel cylinders far more
     * conductive than the matrix (copper is about 2000 times the resin). Enamel and voids are ignored.
     *
     * @param matrixConductivityWPerMK resin or varnish conductivity, W/(m K), &gt; 0
     * @param copperFill               copper share of the cross-section, 0 to 0.85
     */
    public static double acrossWiresWPerMK(double matrixConductivityWPerMK, double copperFill) {
        new coilwright.validation.Checks().positive("matrixConductivityWPerMK", matrixConductivityWPerMK)
                .range("copperFill", copperFill, 0, 0.85).throwIfAny();
        return matrixConductivityWPerMK * (1 + copperFill) / (1 - copperFill);
    }
}
