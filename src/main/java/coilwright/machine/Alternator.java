package coilwright.machine;

import coilwright.conductor.FillCheck;
import coilwright.conductor.InductanceEstimate;
import coilwright.conductor.PhaseResistance;
import coilwright.magnet.GapField;
import coilwright.winding.Winding;

import java.util.List;

/**
 * The derived constants of an alternator: what it generates per rpm, its resistance and inductance, masses and checks.
 * Built by {@link AlternatorModel#build(AlternatorSpec)}.
 *
 * @param spec                          the input
 * @param winding                       the winding layout and factors
 * @param gapField                      the magnet field and flux per pole
 * @param seriesTurnsPerPhase           N_ph = coils per phase x turns per coil / parallel paths
 * @param computedKePhaseRmsVPerRpm     phase EMF per rpm from the flux and winding (rms)
 * @param kePhaseRmsVPerRpm             phase EMF per rpm used (measured value if given)
 * @param keLineRmsVPerRpm              line-to-line EMF per rpm used (rms)
 * @param kePhaseVsPerRad               phase EMF (rms) per mechanical rad/s
 * @param ktNmPerA                      torque per A rms of phase current in phase with the EMF: m x kePhaseVsPerRad
 * @param keMeasured                    true when a measured constant replaced the computed one
 * @param emfPerCoilRmsVPerRpm          EMF of one coil per rpm (rms)
 * @param meanTurnLengthM               mean length of one turn
 * @param resistance                    phase resistance at 20 C and at the working temperature, copper mass per phase
 * @param fill                          coil fill against the window
 * @param inductance                    phase inductance used, with its uncertainty (0 when entered)
 * @param copperMassKg                  copper in all phases
 * @param magnetMassKg                  magnets on the rotor(s)
 * @param emfHarmonics                  odd harmonics 3..13 of the phase EMF relative to the fundamental
 * @param windingOverTemperature        the working winding temperature exceeds the insulation class
 * @param warnings                      things the user should look at
 */
public record Alternator(
        AlternatorSpec spec,
        Winding winding,
        GapField gapField,
        int seriesTurnsPerPhase,
        double computedKePhaseRmsVPerRpm,
        double kePhaseRmsVPerRpm,
        double keLineRmsVPerRpm,
        double kePhaseVsPerRad,
        double ktNmPerA,
        boolean keMeasured,
        double emfPerCoilRmsVPerRpm,
        double meanTurnLengthM,
        PhaseResistance resistance,
        FillCheck fill,
        InductanceEstimate inductance,
        double copperMassKg,
        double magnetMassKg,
        List<EmfHarmonic> emfHarmonics,
        boolean windingOverTemperature,
        List<String> warnings) {

    public Alternator {
        emfHarmonics = List.copyOf(emfHarmonics);
        warnings = List.copyOf(warnings);
    }

    /** Pole pairs p. */
    public int polePairs() {
        return spec.winding().poles() / 2;
    }

    /** Electrical frequency f = p n / 60, Hz. */
    public double frequencyHz(double speedRpm) {
        return polePairs() * speedRpm / 60.0;
    }

    /** Phase EMF (rms, fundamental) at a speed, V. */
    public double emfPhaseRmsV(double speedRpm) {
        return kePhaseRmsVPerRpm * speedRpm;
    }

    /** Line-to-line EMF (rms, fundamental) at a speed, V. */
    public double emfLineRmsV(double speedRpm) {
        return keLineRmsVPerRpm * speedRpm;
    }

    /** Third-harmonic phase EMF over the fundamental. */
    public double thirdHarmonicEmfRatio() {
        return emfHarmonics.stream().filter(h -> h.order() == 3).mapToDouble(EmfHarmonic::emfRatio).findFirst().orElse(0);
    }

    /** Phase resistance at the working temperature, ohm. */
    public double phaseResistanceHotOhm() {
        return resistance.resistanceHotOhm();
    }

    /** Phase inductance used, H. */
    public double phaseInductanceH() {
        return inductance.phaseInductanceH();
    }
}
