package coilwright.machine;

import coilwright.validation.Checks;

/**
 * Air-cored coil stator between the two rotor discs of an axial-flux machine. Each coil is a flat loop: a band of
 * conductors of constant width wound round an open middle (the inner opening). The opening is a trapezoid whose
 * radial length equals the magnets' radial length, narrower at the inner radius than at the outer one, so the two
 * bands across the magnets lie roughly along radii. The coil layer's axial thickness is the rotor's
 * {@code coilLayerThicknessM} ({@link coilwright.magnet.AxialDualRotor}).
 * <pre>
 *        outer end: openingMidWidthM + openingTaperM / 2
 *      ____________________
 *      \  |            |  /      the conductor band, conductorBandWidthM wide,
 *       \ |  opening   | /       runs all round the opening
 *        \|____________|/
 *        inner end: openingMidWidthM - openingTaperM / 2
 * </pre>
 *
 * @param conductorBandWidthM width of the band of conductors in the coil plane, measured square to the wire, m
 *                            (1 mm to 200 mm)
 * @param openingMidWidthM    width of the inner opening halfway along its radial length, i.e. at the magnets' centre
 *                            radius, m (0 to 300 mm)
 * @param openingTaperM       how much wider the opening is at its outer end than at its inner end, m (0 to 300 mm,
 *                            at most twice the mid width; the outer end at most 300 mm)
 */
public record AirCoredStator(double conductorBandWidthM, double openingMidWidthM, double openingTaperM)
        implements StatorSpec {
    /** The widest opening end accepted, m. */
    public static final double MAX_OPENING_M = 0.3;
    /** Rounding allowed when an opening end is computed from the mid width and the taper, m. */
    private static final double ROUNDING_M = 1e-12;

    public AirCoredStator {
        Checks c = new Checks()
                .range("conductorBandWidthM", conductorBandWidthM, 0.001, 0.2)
                .range("openingMidWidthM", openingMidWidthM, 0, MAX_OPENING_M)
                .range("openingTaperM", openingTaperM, 0, MAX_OPENING_M);
        if (!c.hasErrors()) {
            c.require(openingTaperM / 2 <= openingMidWidthM + ROUNDING_M, "openingTaperM", openingTaperM,
                    "must be at most twice openingMidWidthM = " + Checks.fmt(openingMidWidthM)
                            + " (the opening cannot be narrower than nothing at its inner end)",
                    "<= 2 * openingMidWidthM");
            c.require(openingMidWidthM + openingTaperM / 2 <= MAX_OPENING_M + ROUNDING_M, "openingTaperM", openingTaperM,
                    "with openingMidWidthM = " + Checks.fmt(openingMidWidthM) + " the opening's outer end would be "
                            + Checks.fmt(openingMidWidthM + openingTaperM / 2) + " m wide; at most " + MAX_OPENING_M,
                    "<= 2 * (" + MAX_OPENING_M + " - openingMidWidthM)");
        }
        c.throwIfAny();
    }

    /**
     * The stator described by the widths of the opening's two ends instead (as a coil former is often measured):
     * mid width = (inner + outer) / 2, taper = outer - inner.
     */
    public static AirCoredStator ofOpeningEnds(double conductorBandWidthM, double innerEndWidthM, double outerEndWidthM) {
        return new AirCoredStator(conductorBandWidthM, (innerEndWidthM + outerEndWidthM) / 2, outerEndWidthM - innerEndWidthM);
    }

    /** Width of the opening at its inner (smaller-radius) end, m. */
    public double openingInnerEndWidthM() {
        return Math.max(0, openingMidWidthM - openingTaperM / 2);
    }

    /** Width of the opening at its outer end, m. */
    public double openingOuterEndWidthM() {
        return openingMidWidthM + openingTaperM / 2;
    }
}
