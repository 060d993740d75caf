package coilwright.machine;

import coilwright.validation.Checks;

/**
 * Air-cored coil stator between the two rotor discs of an axial-flux machine. Each coil is wound round a
 * trapezoidal hole whose radial length equals the magnets' radial length (the legs lie across the magnets'
 * active length); the coil's thickness is the rotor's {@code statorThicknessM}.
 *
 * @param coilLegWidthM        width of the wound bundle of each leg in the coil plane, m (1 mm to 200 mm)
 * @param coilHoleInnerWidthM  width of the hole at its inner (smaller) radius, m (0 to 300 mm)
 * @param coilHoleOuterWidthM  width of the hole at its outer radius, m (0 to 300 mm), at least the inner width
 */
public record AirCoredStator(double coilLegWidthM, double coilHoleInnerWidthM, double coilHoleOuterWidthM)
        implements StatorSpec {
    public AirCoredStator {
        Checks c = new Checks()
                .range("coilLegWidthM", coilLegWidthM, 0.001, 0.2)
                .range("coilHoleInnerWidthM", coilHoleInnerWidthM, 0, 0.3)
                .range("coilHoleOuterWidthM", coilHoleOuterWidthM, 0, 0.3);
        if (!c.hasErrors()) {
            c.require(coilHoleOuterWidthM >= coilHoleInnerWidthM, "coilHoleOuterWidthM", coilHoleOuterWidthM,
                    "must be at least coilHoleInnerWidthM = " + Checks.fmt(coilHoleInnerWidthM), ">= coilHoleInnerWidthM");
        }
        c.throwIfAny();
    }
}
