package coilwright.rewind;

import coilwright.conductor.FillCheck;
import coilwright.conductor.WireSpec;

import java.util.Optional;

/**
 * One stock wire (or strands in hand) for a rewind, with what it gives.
 *
 * @param role                 which choice this is: "AWG below", "AWG above", "metric below", "metric above",
 *                             "strands in hand"
 * @param wire                 the conductor (strands in hand set)
 * @param conductorCopperAreaM2 copper area of the conductor (all strands), m^2
 * @param copperAreaRatio      copper per coil relative to the coil now: N_new A_new / (N_old A_old); 1 = same copper
 * @param wireAreaRatio        enamelled wire area per coil relative to now (over the enamel): a fill relative to the
 *                             present coil, which fitted, used when the window is unknown
 * @param phaseResistanceOhm   predicted phase resistance at the target's winding temperature from the measured
 *                             mean turn length, Ohm (if a resistance was measured)
 * @param fill                 fill check against the coil window (if the window was given)
 * @param output               charging at the target speed with this wire (battery target with measured
 *                             resistance and inductance only)
 * @param currentDensityAPerMm2 rms current density in the copper at the target speed, A/mm^2 (with output only)
 * @param windingTemperatureC  estimated steady mean winding temperature there, C ({@link
 *                             coilwright.conductor.BandTemperature} for {@link RewindPlanner#ASSUMED_COOLING} at
 *                             {@link RewindPlanner#ASSUMED_AMBIENT_C}); empty without output, or when no steady
 *                             temperature exists
 */
public record WireChoice(String role, WireSpec wire, double conductorCopperAreaM2, double copperAreaRatio,
                         double wireAreaRatio, Optional<Double> phaseResistanceOhm, Optional<FillCheck> fill,
                         Optional<OutputEstimate> output, Optional<Double> currentDensityAPerMm2,
                         Optional<Double> windingTemperatureC) {
}
