package coilwright.rewind;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.SampleDesigns;

/** Test fixtures: "measure" a modelled alternator as a rewinder would, and describe it as an existing machine. */
final class MeasuredMachines {
    static final double SPEED_RPM = 300.0;

    private MeasuredMachines() {
    }

    /** Readings a rewinder would take on the modelled machine: voltage and frequency at 300 rpm, R_LL at its working temperature. */
    static Measurements measure(Alternator a) {
        AlternatorSpec s = a.spec();
        double rLine = a.phaseResistanceHotOhm()
                * Terminals.lineResistanceFactor(s.winding().phases(), s.connection());
        return Measurements.of(a.emfLineRmsV(SPEED_RPM), SPEED_RPM, a.frequencyHz(SPEED_RPM), rLine, s.windingTempC());
    }

    /** What a rewinder knows of the modelled machine, with the pole count given as {@code poles} (0 = unknown). */
    static ExistingMachine existing(Alternator a, int poles) {
        AlternatorSpec s = a.spec();
        return new ExistingMachine(s.winding().slots(), poles, s.winding().phases(), s.winding().layers(),
                s.winding().coilPitchSlots(), s.connection(), 0, s.winding().parallelPaths(), s.turnsPerCoil(),
                s.wire(), null, measure(a));
    }

    /** The axial sample with another number of turns per coil. */
    static Alternator axial(int turnsPerCoil) {
        return AlternatorModel.build(SampleDesigns.axial24V().withTurnsPerCoil(turnsPerCoil));
    }

    /** The radial sample with another number of turns per coil. */
    static Alternator radial(int turnsPerCoil) {
        return AlternatorModel.build(SampleDesigns.radial12V().withTurnsPerCoil(turnsPerCoil));
    }
}
