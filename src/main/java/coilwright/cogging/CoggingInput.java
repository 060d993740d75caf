package coilwright.cogging;

import coilwright.magnet.MagnetGrade;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.Checks;
import coilwright.winding.WindingSpec;

/**
 * What the cogging calculation needs of a slotted surface-magnet machine, SI units.
 *
 * @param slots               Q, 2 to 400
 * @param poles               2p, even, 2 to 400
 * @param side                rotor inside or outside the stator
 * @param gapDiameterM        stator surface diameter at the gap, m, 0.01 to 5
 * @param stackLengthM        stack length, m, 0.002 to 2
 * @param airGapM             mechanical gap g, m, 0.0001 to 0.05
 * @param magnetThicknessM    radial magnet thickness l_m, m, 0.0005 to 0.1
 * @param poleArcRatio        magnet arc / pole pitch, 0.3 to 1
 * @param slotOpeningM        slot opening b_o at the gap, m, 0 to 0.1 (0: smooth stator, no cogging)
 * @param remanenceT          Br at the magnet temperature, T, 0.1 to 1.6
 * @param recoilPermeability  mu_rec, 1 to 1.5
 * @param skewSlotPitches     skew of magnets or slots along the stack, in slot pitches, 0 to 2
 */
public record CoggingInput(int slots, int poles, RotorSide side, double gapDiameterM, double stackLengthM,
                           double airGapM, double magnetThicknessM, double poleArcRatio, double slotOpeningM,
                           double remanenceT, double recoilPermeability, double skewSlotPitches) {
    public CoggingInput {
        Checks c = new Checks();
        c.intRange("slots", slots, 2, 400);
        c.intRange("poles", poles, 2, 400);
        c.require(poles % 2 == 0, "poles", poles, "must be even", "even, 2 to 400");
        c.present("side", side);
        c.range("gapDiameterM", gapDiameterM, 0.01, 5);
        c.range("stackLengthM", stackLengthM, 0.002, 2);
        c.range("airGapM", airGapM, 0.0001, 0.05);
        c.range("magnetThicknessM", magnetThicknessM, 0.0005, 0.1);
        c.range("poleArcRatio", poleArcRatio, 0.3, 1.0);
        c.range("slotOpeningM", slotOpeningM, 0, 0.1);
        c.range("remanenceT", remanenceT, 0.1, 1.6);
        c.range("recoilPermeability", recoilPermeability, 1.0, 1.5);
        c.range("skewSlotPitches", skewSlotPitches, 0, 2);
        c.throwIfAny();
        c.require(slotOpeningM < Math.PI * gapDiameterM / slots, "slotOpeningM", slotOpeningM,
                "must be narrower than the slot pitch", "< pi * gapDiameterM / slots").throwIfAny();
    }

    /** The input for a radial rotor and winding at a magnet temperature. */
    public static CoggingInput of(RadialSurfaceRotor rotor, WindingSpec winding, double magnetTempC) {
        MagnetGrade g = rotor.grade();
        return new CoggingInput(winding.slots(), winding.poles(), rotor.side(), rotor.gapDiameterM(),
                rotor.stackLengthM(), rotor.airGapM(), rotor.magnetThicknessM(), rotor.poleArcRatio(),
                rotor.slotOpeningM(), g.remanenceAt(magnetTempC), g.recoilPermeability(), winding.skewSlotPitches());
    }

    /** A copy with another pole-arc ratio. */
    public CoggingInput withPoleArcRatio(double ratio) {
        return new CoggingInput(slots, poles, side, gapDiameterM, stackLengthM, airGapM, magnetThicknessM, ratio,
                slotOpeningM, remanenceT, recoilPermeability, skewSlotPitches);
    }

    /** A copy with another skew. */
    public CoggingInput withSkewSlotPitches(double skew) {
        return new CoggingInput(slots, poles, side, gapDiameterM, stackLengthM, airGapM, magnetThicknessM,
                poleArcRatio, slotOpeningM, remanenceT, recoilPermeability, skew);
    }

    /** A copy with another number of slots and poles. */
    public CoggingInput withSlotsAndPoles(int newSlots, int newPoles) {
        return new CoggingInput(newSlots, newPoles, side, gapDiameterM, stackLengthM, airGapM, magnetThicknessM,
                poleArcRatio, slotOpeningM, remanenceT, recoilPermeability, skewSlotPitches);
    }
}
