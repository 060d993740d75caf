package coilwright.rewind;

import coilwright.machine.Connection;

import java.util.List;
import java.util.Optional;

/**
 * A way to meet the target with the coils as they are: star or delta, and the coils of each phase regrouped into
 * another number of parallel paths that the winding allows.
 *
 * @param connection                     STAR or DELTA
 * @param parallelPaths                  parallel paths per phase
 * @param unchanged                      true for the machine as it is now (listed for comparison)
 * @param keLineRmsVPerRpm               line EMF per rpm (rms), V/rpm
 * @param achieved                       cut-in speed (rpm) for a battery target, or open-circuit line voltage at the
 *                                       target's voltage speed (V) for a voltage target
 * @param relativeDeviation              achieved / wanted - 1 (the ranking key is its magnitude)
 * @param lineVoltageAtTargetSpeedRmsV   open-circuit line voltage (rms) at the target speed, V
 * @param phaseResistanceOhm             phase resistance at the target's winding temperature, Ohm (if measured)
 * @param output                         charging at the target speed (battery target with measured resistance and
 *                                       inductance only)
 * @param description                    what to do, in a sentence
 * @param notes                          cautions that apply
 */
public record Reconnection(Connection connection, int parallelPaths, boolean unchanged, double keLineRmsVPerRpm,
                           double achieved, double relativeDeviation, double lineVoltageAtTargetSpeedRmsV,
                           Optional<Double> phaseResistanceOhm, Optional<OutputEstimate> output, String description,
                           List<String> notes) {
    public Reconnection {
        notes = List.copyOf(notes);
    }
}
