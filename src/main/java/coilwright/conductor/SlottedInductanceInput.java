package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * A slotted radial-flux surface-magnet stator, for {@link InductanceEstimate#slotted}. Rectangular
 * open or semi-closed slots: conductors fill a height {@code slotConductorHeightM} of a slot
 * {@code slotWidthM} wide; above them the slot opening is {@code slotOpeningWidthM} wide and
 * {@code slotOpeningHeightM} high (for an open slot give the slot width and the empty height above the
 * conductors).
 *
 * @param phases               m, 1 to 12
 * @param polePairs            p, 1 to 500
 * @param slots                Q, 1 to 10000
 * @param seriesTurnsPerPhase  N_ph, &gt; 0
 * @param windingFactor        fundamental winding factor kw1, &gt; 0 and &lt;= 1
 * @param airGapRadiusM        radius at the air gap, m, &gt; 0
 * @param stackLengthM         iron stack length, m, &gt; 0
 * @param effectiveAirGapM     magnetic gap seen by the stator current: kc*g + lm/mu_rec for surface
 *                             magnets (see {@link #effectiveAirGapM}), m, &gt; 0
 * @param slotConductorHeightM height of the winding in the slot, m, &gt; 0
 * @param slotWidthM           slot width, m, &gt; 0
 * @param slotOpeningHeightM   height of the slot opening (tooth tip) above the winding, m, &gt;= 0
 * @param slotOpeningWidthM    width of the slot opening, m, &gt; 0
 * @param endWindingLengthM    end-winding length of one turn, both ends together (MLT - 2*stack), m, &gt;= 0
 * @param endWindingPermeance  end-winding permeance factor lambda_ew, &gt;= 0; about 0.3 is typical
 *                             (from memory, range 0.2 to 0.5)
 */
public record SlottedInductanceInput(int phases, int polePairs, int slots, double seriesTurnsPerPhase,
                                     double windingFactor, double airGapRadiusM, double stackLengthM,
                                     double effectiveAirGapM, double slotConductorHeightM, double slotWidthM,
                                     double slotOpeningHeightM, double slotOpeningWidthM, double endWindingLengthM,
                                     double endWindingPermeance) {
    /** A typical end-winding permeance factor (from memory). */
    public static final double TYPICAL_END_WINDING_PERMEANCE = 0.3;

    public SlottedInductanceInput {
        new Checks().intRange("phases", phases, 1, 12).intRange("polePairs", polePairs, 1, 500)
                .intRange("slots", slots, 1, 10_000).positive("seriesTurnsPerPhase", seriesTurnsPerPhase)
                .rangeExclusiveMin("windingFactor", windingFactor, 0.0, 1.0)
                .positive("airGapRadiusM", airGapRadiusM).positive("stackLengthM", stackLengthM)
                .positive("effectiveAirGapM", effectiveAirGapM)
                .positive("slotConductorHeightM", slotConductorHeightM).positive("slotWidthM", slotWidthM)
                .nonNegative("slotOpeningHeightM", slotOpeningHeightM)
                .positive("slotOpeningWidthM", slotOpeningWidthM)
                .nonNegative("endWindingLengthM", endWindingLengthM)
                .range("endWindingPermeance", endWindingPermeance, 0.0, 2.0).throwIfAny();
    }

    /**
     * Effective magnetic gap of a surface-magnet machine for the stator's field: the Carter-scaled air
     * gap plus the magnet thickness divided by its recoil permeability, g_eff = kc*g + lm/mu_rec.
     *
     * @param airGapM            mechanical air gap g, m, &gt; 0
     * @param carterCoefficient  kc, 1 to 3
     * @param magnetThicknessM   lm, m, &gt;= 0
     * @param recoilPermeability mu_rec (relative), 1 to 2
     * @return effective gap, m
     */
    public static double effectiveAirGapM(double airGapM, double carterCoefficient, double magnetThicknessM,
                                          double recoilPermeability) {
        new Checks().positive("airGapM", airGapM).range("carterCoefficient", carterCoefficient, 1.0, 3.0)
                .nonNegative("magnetThicknessM", magnetThicknessM)
                .range("recoilPermeability", recoilPermeability, 1.0, 2.0).throwIfAny();
        return carterCoefficient * airGapM + magnetThicknessM / recoilPermeability;
    }
}
