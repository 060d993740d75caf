package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * The cross-section available to one coil side: where all turns of one leg of one coil must fit.
 *
 * @param areaM2 available area, m^2, &gt; 0
 * @param kind   slotted (iron stator) or air-cored (free coil); decides the practical fill limit
 */
public record CoilWindow(double areaM2, Kind kind) {
    /** Where the coil sits. */
    public enum Kind { SLOTTED, AIR_CORED }

    public CoilWindow {
        new Checks().positive("areaM2", areaM2).present("kind", kind).throwIfAny();
    }

    /**
     * A slot shared by two coil sides (double-layer winding): half the slot area left inside the liner.
     *
     * @param slotAreaM2  slot cross-section, m^2, &gt; 0
     * @param linerAreaM2 area taken by the slot liner and separator, m^2, 0 to less than the slot area
     */
    public static CoilWindow slottedDoubleLayer(double slotAreaM2, double linerAreaM2) {
        return new CoilWindow(slotFree(slotAreaM2, linerAreaM2) / 2.0, Kind.SLOTTED);
    }

    /** A slot holding one coil side (single-layer winding): the slot area left inside the liner. */
    public static CoilWindow slottedSingleLayer(double slotAreaM2, double linerAreaM2) {
        return new CoilWindow(slotFree(slotAreaM2, linerAreaM2), Kind.SLOTTED);
    }

    /**
     * One leg of a flat air-cored coil: leg width (in the coil's plane) times coil thickness (axial).
     *
     * @param legWidthM      width of the wound bundle, m, &gt; 0
     * @param coilThicknessM axial thickness of the coil, m, &gt; 0
     */
    public static CoilWindow airCored(double legWidthM, double coilThicknessM) {
        new Checks().positive("legWidthM", legWidthM).positive("coilThicknessM", coilThicknessM).throwIfAny();
        return new CoilWindow(legWidthM * coilThicknessM, Kind.AIR_CORED);
    }

    private static double slotFree(double slotAreaM2, double linerAreaM2) {
        Checks c = new Checks().positive("slotAreaM2", slotAreaM2).nonNegative("linerAreaM2", linerAreaM2);
        if (!c.hasErrors()) {
            c.require(linerAreaM2 < slotAreaM2, "linerAreaM2", linerAreaM2,
                    "must be less than slotAreaM2 = " + Checks.fmt(slotAreaM2), "0 to < slotAreaM2");
        }
        c.throwIfAny();
        return slotAreaM2 - linerAreaM2;
    }
}
