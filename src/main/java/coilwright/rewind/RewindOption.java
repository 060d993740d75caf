package coilwright.rewind;

import coilwright.machine.Connection;

import java.util.List;
import java.util.Optional;

/**
 * A new winding: turns per coil for one connection and parallel-path choice, and the wires that fill the same
 * copper area per coil.
 *
 * @param connection                   STAR or DELTA
 * @param parallelPaths                parallel paths per phase
 * @param turnsPerCoil                 new turns per coil (whole)
 * @param exactTurnsPerCoil            the turns that would meet the target exactly (not whole)
 * @param seriesTurnsPerPhase          coils per phase x turns per coil / paths
 * @param keLineRmsVPerRpm             line EMF per rpm (rms) with these turns, V/rpm
 * @param achieved                     cut-in speed (rpm) or line voltage at the voltage speed (V), as the target
 * @param relativeDeviation            achieved / wanted - 1
 * @param lineVoltageAtTargetSpeedRmsV open-circuit line voltage (rms) at the target speed, V
 * @param conductorCopperAreaM2        copper area per conductor that keeps the copper per coil: A_old N_old / N_new, m^2
 * @param wireChoices                  nearest AWG and metric sizes below and above, and strands-in-hand alternatives
 * @param notes                        cautions that apply
 * @param currentDensityAPerMm2        rms current density at the target speed with the wire nearest the copper area
 *                                     kept, A/mm^2 (battery target with measured resistance and inductance only)
 * @param windingTemperatureC          estimated steady mean winding temperature with that wire, C (see
 *                                     {@link WireChoice#windingTemperatureC()})
 */
public record RewindOption(Connection connection, int parallelPaths, int turnsPerCoil, double exactTurnsPerCoil,
                           int seriesTurnsPerPhase, double keLineRmsVPerRpm, double achieved,
                           double relativeDeviation, double lineVoltageAtTargetSpeedRmsV,
                           double conductorCopperAreaM2, List<WireChoice> wireChoices, List<String> notes,
                           Optional<Double> currentDensityAPerMm2, Optional<Double> windingTemperatureC) {
    public RewindOption {
        wireChoices = List.copyOf(wireChoices);
        notes = List.copyOf(notes);
    }
}
