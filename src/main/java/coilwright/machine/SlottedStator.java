package coilwright.machine;

import coilwright.validation.Checks;

/**
 * Slotted iron stator with rectangular slots. The slot opening (for the Carter coefficient) belongs to the rotor's
 * {@code RadialSurfaceRotor.slotOpeningM}, since it shapes the gap field.
 *
 * @param slotDepthM            depth of the slot available to the winding, m (1 mm to 200 mm)
 * @param slotWidthM            mean slot width, m (0.5 mm to 100 mm)
 * @param toothTipHeightM       height of the tooth tips above the winding, m (0 to 20 mm)
 * @param slotLinerThicknessM   slot insulation thickness, m (0 to 2 mm)
 * @param endExtensionM         straight length of each coil beyond the stack before the end turn bends, m (0 to 100 mm)
 */
public record SlottedStator(double slotDepthM, double slotWidthM, double toothTipHeightM, double slotLinerThicknessM,
                            double endExtensionM) implements StatorSpec {
    public SlottedStator {
        new Checks()
                .range("slotDepthM", slotDepthM, 0.001, 0.2)
                .range("slotWidthM", slotWidthM, 0.0005, 0.1)
                .range("toothTipHeightM", toothTipHeightM, 0, 0.02)
                .range("slotLinerThicknessM", slotLinerThicknessM, 0, 0.002)
                .range("endExtensionM", endExtensionM, 0, 0.1)
                .throwIfAny();
    }

    /** Gross slot cross-section, m^2. */
    public double slotAreaM2() {
        return slotDepthM * slotWidthM;
    }

    /** Cross-section taken by the liner on both walls and the bottom, m^2. */
    public double linerAreaM2() {
        return slotLinerThicknessM * (2 * slotDepthM + slotWidthM);
    }
}
