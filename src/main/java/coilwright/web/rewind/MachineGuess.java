package coilwright.web.rewind;

import coilwright.winding.Layers;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * The rotor and stator a rewind option opens the design form with. The planner knows the winding, the measured EMF
 * constant, inductance and resistance, but not the machine's dimensions: these are a consistent starting guess (to be
 * replaced by the dimensions measured on the bench) whose magnets fit the pole count and whose mean turn is the one
 * the measured resistance implies, so the evaluation's resistance and copper loss are the machine's, not a default's.
 * The EMF does not depend on the guess: the measured constant replaces the computed one. Values are written in the
 * design form's SI units (mm); typical proportions are common practice.
 */
final class MachineGuess {
    /** Magnet width as a share of the room between neighbouring magnets (common practice). */
    private static final double MAGNET_SHARE = 0.75;
    /** Axial: radial magnet length, conductor band and opening taper of the form's starting machine, m. */
    private static final double AXIAL_MAGNET_LENGTH_M = 0.030;
    private static final double AXIAL_BAND_M = 0.015;
    private static final double AXIAL_TAPER_M = 0.010;
    private static final double AXIAL_OPENING_M = 0.030;
    /** Axial: smallest inner magnet radius, m, and the room left round the coil ring. */
    private static final double AXIAL_MIN_INNER_RADIUS_M = 0.115;
    private static final double RING_MARGIN = 1.15;
    /** Radial: stack, slot depth, tooth tip and air gap of a small motor, m; slot width as a share of the pitch. */
    private static final double RADIAL_STACK_M = 0.05;
    private static final double RADIAL_MIN_STACK_M = 0.01;
    private static final double RADIAL_SLOT_DEPTH_M = 0.015;
    private static final double RADIAL_TOOTH_TIP_M = 0.001;
    private static final double RADIAL_AIR_GAP_M = 0.001;
    private static final double RADIAL_SLOT_SHARE = 0.45;
    /** Radial: slot pitch at the bore, m, which sets the bore for a number of slots (common practice). */
    private static final double RADIAL_SLOT_PITCH_M = 0.012;
    private static final double RADIAL_MIN_GAP_DIAMETER_M = 0.10;
    private static final double RADIAL_DEFAULT_EXTENSION_M = 0.005;
    /** Radial: share of the slot the wire's overall section may take, and the liner (common practice). */
    private static final double WIRE_FILL = 0.45;
    private static final double LINER_M = 0.0003;

    private MachineGuess() {
    }

    /** An axial dual rotor and air-cored coils: magnets that fit, openings sized to the measured mean turn. */
    static void axial(Map<String, String> p, int slots, Layers layers, int poles, OptionalDouble meanTurnM) {
        int coils = layers == Layers.DOUBLE ? slots : Math.max(1, slots / 2);
        double slant = 2 * Math.hypot(AXIAL_MAGNET_LENGTH_M, AXIAL_TAPER_M / 2);
        double opening = meanTurnM.isPresent()
                ? Math.max(AXIAL_TAPER_M, (meanTurnM.getAsDouble() - slant - Math.PI * AXIAL_BAND_M) / 2)
                : AXIAL_OPENING_M;
        double innerCoilWidth = opening - AXIAL_TAPER_M / 2 + 2 * AXIAL_BAND_M;
        double inner = Math.max(AXIAL_MIN_INNER_RADIUS_M, RING_MARGIN * coils * innerCoilWidth / (2 * Math.PI));
        double centre = inner + AXIAL_MAGNET_LENGTH_M / 2;
        double room = Math.min(2 * Math.PI * centre / poles, 2 * inner * Math.tan(Math.PI / poles));
        p.put("topology", "AXIAL_DUAL");
        mm(p, "alternator.rotor.magnetCentreRadiusM", centre);
        mm(p, "alternator.rotor.magnetLengthM", AXIAL_MAGNET_LENGTH_M);
        mm(p, "alternator.rotor.magnetWidthM", MAGNET_SHARE * room);
        mm(p, "alternator.stator.conductorBandWidthM", AXIAL_BAND_M);
        mm(p, "alternator.stator.openingMidWidthM", opening);
        mm(p, "alternator.stator.openingTaperM", AXIAL_TAPER_M);
    }

    /**
     * An inner rotor in a slotted stator: a bore that holds the slots, slots deep enough for the coil sides at a
     * practical fill, a stack length that gives the measured mean turn.
     *
     * @param coilSideM2 overall cross-section of the conductors of one coil side, m²
     */
    static void radial(Map<String, String> p, int slots, int pitchSlots, OptionalDouble meanTurnM, Layers layers,
                       double coilSideM2) {
        double gapDiameter = Math.max(RADIAL_MIN_GAP_DIAMETER_M, slots * RADIAL_SLOT_PITCH_M / Math.PI);
        double bore = gapDiameter / 2 + RADIAL_AIR_GAP_M;
        double slotWidth = RADIAL_SLOT_SHARE * 2 * Math.PI * (bore + RADIAL_TOOTH_TIP_M) / slots;
        double sidesPerSlot = layers == Layers.DOUBLE ? 2 : 1;
        double depth = Math.max(RADIAL_SLOT_DEPTH_M, sidesPerSlot * coilSideM2 / WIRE_FILL / slotWidth + 2 * LINER_M);
        double midSlot = bore + RADIAL_TOOTH_TIP_M + depth / 2;
        double span = 2 * Math.PI * midSlot * Math.max(1, pitchSlots) / slots;
        // MLT = 2 stack + 2 ((pi/2) span + 2 extension) (MeanTurnLength.radialSlotted): the stack takes what the
        // measured turn leaves after the end turns, down to a thin stack with no straight extension
        double extension = RADIAL_DEFAULT_EXTENSION_M;
        double stack = RADIAL_STACK_M;
        if (meanTurnM.isPresent()) {
            stack = (meanTurnM.getAsDouble() - Math.PI * span - 4 * extension) / 2;
            if (stack < RADIAL_MIN_STACK_M) {
                stack = RADIAL_MIN_STACK_M;
                extension = Math.max(0, (meanTurnM.getAsDouble() - 2 * stack - Math.PI * span) / 4);
            }
        }
        p.put("topology", "RADIAL_INNER");
        mm(p, "alternator.rotor.gapDiameterM", gapDiameter);
        mm(p, "alternator.rotor.stackLengthM", stack);
        mm(p, "alternator.rotor.airGapM", RADIAL_AIR_GAP_M);
        mm(p, "alternator.stator.slotDepthM", depth);
        mm(p, "alternator.stator.toothTipHeightM", RADIAL_TOOTH_TIP_M);
        mm(p, "alternator.stator.slotWidthM", slotWidth);
        mm(p, "alternator.stator.slotLinerThicknessM", LINER_M);
        mm(p, "alternator.stator.endExtensionM", extension);
    }

    private static void mm(Map<String, String> p, String field, double metres) {
        p.put(field, String.format(java.util.Locale.ROOT, "%.2f", 1000 * metres));
    }
}
