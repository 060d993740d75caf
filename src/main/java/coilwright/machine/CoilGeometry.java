package coilwright.machine;

import coilwright.conductor.AirCoredInductanceInput;
import coilwright.conductor.CoilWindow;
import coilwright.conductor.InductanceEstimate;
import coilwright.conductor.MeanTurnLength;
import coilwright.conductor.SlottedInductanceInput;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.GapField;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;
import coilwright.winding.Layers;
import coilwright.winding.Winding;

/**
 * Coil geometry of a stator: mean turn length, the window one coil side may fill, and the inductance estimate.
 *
 * @param meanTurnLengthM mean length of one turn, m
 * @param window          area available to one coil side
 * @param legWidthM       width of one coil's conductor band (air-cored) or slot width (slotted), m
 */
record CoilGeometry(double meanTurnLengthM, CoilWindow window, double legWidthM) {

    /** Share of the slot pitch a slot may take before the teeth become too thin to carry flux. common practice */
    static final double MAX_SLOT_SHARE_OF_PITCH = 0.75;

    static CoilGeometry slotted(RadialSurfaceRotor rotor, SlottedStator stator, Winding winding) {
        int slots = winding.spec().slots();
        double boreRadiusM = rotor.gapDiameterM() / 2;
        boolean inner = rotor.side() == RotorSide.INNER;
        // slots open towards the gap: outward from the bore for an inner rotor, inward for an outer rotor
        double midSlotRadiusM = inner ? boreRadiusM + stator.toothTipHeightM() + stator.slotDepthM() / 2
                : boreRadiusM - stator.toothTipHeightM() - stator.slotDepthM() / 2;
        double narrowestRadiusM = inner ? boreRadiusM + stator.toothTipHeightM()
                : boreRadiusM - stator.toothTipHeightM() - stator.slotDepthM();
        if (narrowestRadiusM <= 0) {
            throw new InfeasibleDesignException("stator.slotDepthM", "stator.slotDepthM = " + Checks.fmt(stator.slotDepthM())
                    + ": the slots reach the axis of an outer-rotor stator of diameter " + Checks.fmt(rotor.gapDiameterM()) + " m");
        }
        double pitchAtNarrowestM = 2 * Math.PI * narrowestRadiusM / slots;
        if (stator.slotWidthM() > MAX_SLOT_SHARE_OF_PITCH * pitchAtNarrowestM) {
            throw new InfeasibleDesignException("stator.slotWidthM", String.format(java.util.Locale.ROOT,
                    "stator.slotWidthM = %s: %d slots of this width leave teeth too thin; at most %.4f m "
                            + "(%.0f %% of the %.4f m slot pitch where the teeth are narrowest)",
                    Checks.fmt(stator.slotWidthM()), slots, MAX_SLOT_SHARE_OF_PITCH * pitchAtNarrowestM,
                    100 * MAX_SLOT_SHARE_OF_PITCH, pitchAtNarrowestM));
        }
        double coilSpanM = 2 * Math.PI * midSlotRadiusM * winding.coilPitchSlots() / slots;
        double mltM = MeanTurnLength.radialSlotted(rotor.stackLengthM(), coilSpanM, stator.endExtensionM());
        CoilWindow window = winding.spec().layers() == Layers.DOUBLE
                ? CoilWindow.slottedDoubleLayer(stator.slotAreaM2(), stator.linerAreaM2())
                : CoilWindow.slottedSingleLayer(stator.slotAreaM2(), stator.linerAreaM2());
        return new CoilGeometry(mltM, window, stator.slotWidthM());
    }

    static CoilGeometry airCored(AxialDualRotor rotor, AirCoredStator stator, Winding winding) {
        int coils = winding.coils().size();
        double bandM = stator.conductorBandWidthM();
        // coils sit side by side round the stator ring; each takes its opening plus a band on either side
        checkRing(coils, stator.openingInnerEndWidthM() + 2 * bandM, rotor.innerRadiusM(), "inner");
        checkRing(coils, stator.openingOuterEndWidthM() + 2 * bandM, rotor.outerRadiusM(), "outer");
        double mltM = MeanTurnLength.axialCoilAroundOpening(rotor.magnetLengthM(), stator.openingMidWidthM(),
                stator.openingTaperM(), bandM);
        return new CoilGeometry(mltM, CoilWindow.airCored(bandM, rotor.coilLayerThicknessM()), bandM);
    }

    private static void checkRing(int coils, double coilWidthM, double radiusM, String edge) {
        double availableM = 2 * Math.PI * radiusM;
        if (coils * coilWidthM > availableM) {
            throw new InfeasibleDesignException("stator.conductorBandWidthM", String.format(java.util.Locale.ROOT,
                    "stator.conductorBandWidthM: %d coils each %.4f m wide (opening + 2 conductor bands) need %.4f m at"
                            + " the magnets' %s radius %.4f m, but the circumference there is only %.4f m; make the"
                            + " bands or the openings narrower",
                    coils, coilWidthM, coils * coilWidthM, edge, radiusM, availableM));
        }
    }

    static InductanceEstimate estimateSlotted(RadialSurfaceRotor rotor, SlottedStator stator, Winding winding,
                                              GapField field, int seriesTurnsPerPhase, double mltM) {
        double effGapM = SlottedInductanceInput.effectiveAirGapM(rotor.airGapM(), field.carterCoefficient(),
                rotor.magnetThicknessM(), rotor.grade().recoilPermeability());
        double slotOpeningM = rotor.slotOpeningM() > 0 ? rotor.slotOpeningM() : stator.slotWidthM();
        double endWindingM = Math.max(0, mltM - 2 * rotor.stackLengthM());
        return InductanceEstimate.slotted(new SlottedInductanceInput(winding.spec().phases(), winding.spec().polePairs(),
                winding.spec().slots(), seriesTurnsPerPhase, winding.fundamentalWindingFactor(),
                rotor.gapDiameterM() / 2, rotor.stackLengthM(), effGapM, stator.slotDepthM(), stator.slotWidthM(),
                stator.toothTipHeightM(), slotOpeningM, endWindingM, SlottedInductanceInput.TYPICAL_END_WINDING_PERMEANCE));
    }

    static InductanceEstimate estimateAirCored(AxialDualRotor rotor, AirCoredStator stator, Winding winding,
                                               int turnsPerCoil, double mltM) {
        return InductanceEstimate.airCored(new AirCoredInductanceInput(turnsPerCoil, winding.coilsPerPhase(),
                winding.spec().parallelPaths(), mltM, stator.conductorBandWidthM(), rotor.coilLayerThicknessM()));
    }
}
