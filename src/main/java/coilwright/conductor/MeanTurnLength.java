package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * Mean length of one turn of a coil, from its geometry.
 */
public final class MeanTurnLength {
    private MeanTurnLength() {
    }

    /**
     * A coil in the slots of a radial-flux stator: two sides in the stack and two end turns, each end turn
     * a half circle over the coil span plus a straight run out of each of its two slots:
     * MLT = 2*stack + 2*((pi/2)*coilSpan + 2*extension) (common practice).
     *
     * @param stackLengthM       iron stack (active) length, m, &gt; 0
     * @param coilSpanM          chord between the centres of the coil's two slots at mid-slot height, m, &gt; 0
     * @param straightExtensionM straight length of a coil side beyond the stack before it bends, m, &gt;= 0
     * @return mean turn length, m
     */
    public static double radialSlotted(double stackLengthM, double coilSpanM, double straightExtensionM) {
        new Checks().positive("stackLengthM", stackLengthM).positive("coilSpanM", coilSpanM)
                .nonNegative("straightExtensionM", straightExtensionM).throwIfAny();
        double endTurnM = Math.PI / 2.0 * coilSpanM + 2.0 * straightExtensionM;
        return 2.0 * stackLengthM + 2.0 * endTurnM;
    }

    /**
     * A flat coil of an axial-flux air-cored stator: a band of conductors wound round a trapezoidal inner opening
     * (a rectangle without taper). The opening is {@code openingMidWidthM} wide halfway along its radial length L and
     * {@code openingTaperM} wider at its outer end than at its inner end, so its perimeter is
     * P = 2 * mid width + 2 * sqrt(L^2 + (taper/2)^2). The mean turn is the curve at half the band width outside the
     * opening: for a convex outline the curve offset by a distance d has the perimeter P + 2*pi*d with rounded
     * corners, so MLT = P + pi * band width (exact geometry).
     *
     * @param radialLengthM    radial length of the opening (the active length of each side), m, &gt; 0
     * @param openingMidWidthM opening width halfway along, m, &gt;= 0
     * @param openingTaperM    outer end width minus inner end width, m, &gt;= 0
     * @param bandWidthM       width of the conductor band in the coil's plane, m, &gt; 0
     * @return mean turn length, m
     */
    public static double axialCoilAroundOpening(double radialLengthM, double openingMidWidthM, double openingTaperM,
                                                double bandWidthM) {
        new Checks().positive("radialLengthM", radialLengthM).nonNegative("openingMidWidthM", openingMidWidthM)
                .nonNegative("openingTaperM", openingTaperM).positive("bandWidthM", bandWidthM).throwIfAny();
        double slant = Math.hypot(radialLengthM, openingTaperM / 2.0);
        return 2.0 * openingMidWidthM + 2.0 * slant + Math.PI * bandWidthM;
    }

    /**
     * A coil described by its parts: two legs and the inner and outer end turns measured along the mean
     * turn, MLT = 2*leg + innerEnd + outerEnd.
     *
     * @param legLengthM      length of one leg along the mean turn, m, &gt; 0
     * @param innerEndTurnM   length of the inner end turn along the mean turn, m, &gt;= 0
     * @param outerEndTurnM   length of the outer end turn along the mean turn, m, &gt;= 0
     * @return mean turn length, m
     */
    public static double fromParts(double legLengthM, double innerEndTurnM, double outerEndTurnM) {
        new Checks().positive("legLengthM", legLengthM).nonNegative("innerEndTurnM", innerEndTurnM)
                .nonNegative("outerEndTurnM", outerEndTurnM).throwIfAny();
        return 2.0 * legLengthM + innerEndTurnM + outerEndTurnM;
    }
}
