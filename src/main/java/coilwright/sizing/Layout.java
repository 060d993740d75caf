package coilwright.sizing;

import coilwright.conductor.CoilWindow;
import coilwright.machine.StatorSpec;
import coilwright.magnet.MagnetMaterial;
import coilwright.magnet.RotorSpec;
import coilwright.winding.WindingSpec;

import java.util.List;

/**
 * One buildable geometry and winding layout with the constants every candidate on it shares, taken from one build
 * of the full model ({@link coilwright.machine.AlternatorModel}) so that the gap field and the star of slots are
 * solved once per layout, not per candidate.
 *
 * @param rotor                rotor and magnets
 * @param stator               stator matching the rotor
 * @param winding              slots (coil positions), poles, layers; one parallel path
 * @param coilsPerPhase        coils in each phase
 * @param windingFactor        fundamental winding factor with skew
 * @param fluxPerPoleWb        fundamental flux per pole at the magnet temperature, Wb
 * @param meanTurnLengthM      mean turn length, m
 * @param windowAreaM2         area one coil side may fill, m^2
 * @param windowKind           slotted (copper fill limited) or air-cored (wire fill limited)
 * @param inductanceOneTurnH   phase inductance of the full model's estimate with one turn per coil and one path, H;
 *                             every part of the estimate grows as the square of the series turns
 * @param magnetMassKg         magnets on the rotor(s), kg
 * @param magnetMaterial       for the magnet price
 * @param parallelPaths        the path counts the layout allows, within the request's maximum
 * @param label                a short description for people
 */
record Layout(RotorSpec rotor, StatorSpec stator, WindingSpec winding, int coilsPerPhase, double windingFactor,
              double fluxPerPoleWb, double meanTurnLengthM, double windowAreaM2, CoilWindow.Kind windowKind,
              double inductanceOneTurnH, double magnetMassKg, MagnetMaterial magnetMaterial, List<Integer> parallelPaths, String label) {
    Layout {
        parallelPaths = List.copyOf(parallelPaths);
    }

    int polePairs() {
        return winding.polePairs();
    }
}
