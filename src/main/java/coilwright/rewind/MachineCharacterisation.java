package coilwright.rewind;

import java.util.List;
import java.util.Optional;

/**
 * What the measurements say about the existing machine.
 *
 * @param poles                      pole count used (given, or inferred from the frequency)
 * @param polesInferred              true when the pole count came from the frequency
 * @param coilsPerPhase              coils in each phase (from the layout)
 * @param parallelPaths              parallel paths now
 * @param seriesTurnsPerPhase        N_ph = coilsPerPhase * turnsPerCoil / parallelPaths
 * @param coilPitchSlots             coil pitch of the layout, slots
 * @param fundamentalWindingFactor   kw1 of the layout (no skew)
 * @param thirdHarmonicWindingFactor kw3 of the layout (a delta connection lets a third-harmonic EMF circulate)
 * @param allowedParallelPaths       parallel-path counts the layout allows (equal EMF in every path)
 * @param keLineRmsVPerRpm           line-to-line open-circuit EMF per rpm (rms), V/rpm
 * @param kePhaseRmsVPerRpm          phase EMF per rpm (rms), V/rpm
 * @param windingFactorTimesFluxWb   kw1 * Phi1 from E_ph = sqrt(2) pi f N_ph kw1 Phi1, Wb
 * @param phaseResistanceOhm         phase resistance at the measured temperature, Ohm (if measured)
 * @param phaseResistance20COhm      the same at 20 C (IEC 60028 copper), Ohm (if measured)
 * @param meanTurnLengthM            mean turn length implied by the resistance, m (if measured)
 * @param phaseInductanceH           phase inductance from the line-to-line reading, H (if measured; +-10 %)
 * @param measuredTemperatureC       copper temperature of the resistance reading, C
 * @param derivedFrom                what was derived and from which reading, in sentences
 * @param warnings                   things to check
 */
public record MachineCharacterisation(int poles, boolean polesInferred, int coilsPerPhase, int parallelPaths,
                                      int seriesTurnsPerPhase, int coilPitchSlots, double fundamentalWindingFactor,
                                      double thirdHarmonicWindingFactor, List<Integer> allowedParallelPaths,
                                      Band keLineRmsVPerRpm, Band kePhaseRmsVPerRpm, Band windingFactorTimesFluxWb,
                                      Optional<Band> phaseResistanceOhm, Optional<Band> phaseResistance20COhm,
                                      Optional<Band> meanTurnLengthM, Optional<Band> phaseInductanceH,
                                      double measuredTemperatureC,
                                      List<String> derivedFrom, List<String> warnings) {
    public MachineCharacterisation {
        allowedParallelPaths = List.copyOf(allowedParallelPaths);
        derivedFrom = List.copyOf(derivedFrom);
        warnings = List.copyOf(warnings);
    }
}
