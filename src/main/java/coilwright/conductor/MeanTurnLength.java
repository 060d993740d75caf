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
     * A flat coil of an axial-flux air-cored stator wound around a trapezoidal hole (a rectangle when the
     * two widths are equal). The hole has parallel inner and outer edges {@code holeInnerWidthM} and
     * {@code holeOuterWidthM} a radial distance {@code radialLegLengthM} apart. The mean turn is the curve
     * at half the leg width outside the hole: for a convex outline the curve offset by a distance t has the
     * perimeter P + 2*pi*t with rounded corners, so MLT = P_hole + pi*legWidth (exact geometry).
     *
     * @param radialLegLengthM radial length of the hole, which is the straight (active) length of each leg, m, &gt; 0
     * @param holeInnerWidthM  hole width at the inner radius, m, &gt;= 0
     * @param holeOuterWidthM  hole width at the outer radius, m, &gt;= 0
     * @param legWidthM        width of the wound bundle in the coil's plane (radial build), m, &gt; 0
     * @return mean turn length, m
     */
    public static double axialCoil(double radialLegLengthM, double holeInnerWidthM, double holeOuterWidthM,
                                   double legWidthM) {
        new Checks().positive("radialLegLengthM", radialLegLengthM).nonNegative("holeInnerWidthM", holeInnerWidthM)
                .nonNegative("holeOuterWidthM", holeOuterWidthM).positive("legWidthM", legWidthM).throwIfAny();
        double slant = Math.hypot(radialLegLengthM, (holeOuterWidthM - holeInnerWidthM) / 2.0);
        double holePerimeterM = holeInnerWidthM + holeOuterWidthM + 2.0 * slant;
        return holePerimeterM + Math.PI * legWidthM;
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
