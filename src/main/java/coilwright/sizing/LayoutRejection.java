package coilwright.sizing;

/** Why a proposed geometry or layout was not searched. */
enum LayoutRejection {
    MAGNETS_DO_NOT_FIT("the magnets do not fit the rotor at that pole count"),
    MAGNET_ARC_OUT_OF_RANGE("the blocks make a pole-arc ratio outside 0.3 to 1"),
    COILS_DO_NOT_FIT("the coils do not fit round the stator ring"),
    WINDING_NOT_BALANCED("the slot (coil) and pole counts cannot make a balanced three-phase winding"),
    WINDING_FACTOR_BELOW_FLOOR("the fundamental winding factor is below winding.minWindingFactor"),
    MODEL_REFUSED("the full model refused the geometry (teeth too thin, window too small)");

    private final String reason;

    LayoutRejection(String reason) {
        this.reason = reason;
    }

    String reason() {
        return reason;
    }
}
