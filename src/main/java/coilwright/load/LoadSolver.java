package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.Checks;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

/**
 * Solves one operating point of an alternator (a sinusoidal source, see {@link AcSource}) and its load.
 * A delta winding is replaced by its equivalent star (E/sqrt(3), R/3, L/3), which has the same terminal
 * behaviour; with the fundamental EMF only, no current circulates inside the delta.
 */
public final class LoadSolver {
    private static final double SQRT3 = Math.sqrt(3);

    private LoadSolver() {
    }

    /**
     * @param source the alternator at this speed
     * @param load   a {@link BatteryLoad} or a {@link ResistiveLoad}
     * @return the operating point
     * @throws InvalidInputException when the bridge does not match the source's phase count
     */
    public static OperatingPoint solve(AcSource source, Load load) {
        new Checks().present("source", source).present("load", load).throwIfAny();
        if (load instanceof BatteryLoad b) {
            return battery(source, b);
        }
        return resistive(source, (ResistiveLoad) load);
    }

    /** The bridge circuit for a source and a battery load, in equivalent-star values. */
    public static BridgeCircuit circuit(AcSource s, BatteryLoad b) {
        BridgeType type = b.rectifier().type();
        BridgeType expected = s.phases() == 3 ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE;
        if (type != expected) {
            throw new InvalidInputException(new FieldError("rectifier.type", type.name(),
                    "rectifier.type = " + type + ": must be " + expected + " for a " + s.phases() + "-phase source",
                    expected.name()));
        }
        return new BridgeCircuit(type, s.starEmfRmsV(), s.frequencyHz(), s.starResistanceOhm(),
                b.acCable().lineResistanceOhm(), s.starInductanceH(), b.battery().voltageV(),
                b.rectifier().forwardDropV(), b.dcCable().pairResistanceOhm(), b.battery().internalResistanceOhm());
    }

    private static OperatingPoint battery(AcSource s, BatteryLoad b) {
        BridgeOperatingPoint p = BridgeSolver.solve(circuit(s, b));
        boolean delta = s.connection() == Connection.DELTA;
        double phaseRms = delta ? p.lineCurrentRmsA() / SQRT3 : p.lineCurrentRmsA();
        double phasePeak = delta ? p.deltaPhaseCurrentPeakA() : p.lineCurrentPeakA();
        return new OperatingPoint(p.mode(), p.lineToLineTerminalVoltageRmsV(), phaseRms, phasePeak,
                p.lineCurrentRmsA(), p.lineCurrentPeakA(), p.powerFromEmfW(), p.powerToBatteryW(),
                p.windingCopperLossW(), p.acCableLossW(), p.dcCableLossW(), p.batteryInternalLossW(),
                p.diodeLossW(), p.dcCurrentA(), p.dcCurrentRmsA(), p.dcVoltageAtRectifierV(), p.batteryVoltageV(),
                p.conductionAngleDeg(), p.commutationOverlapDeg());
    }

    /** Phasor solution I = E / ((R + R_cable + R_load) + jX) per star phase (single-phase: the loop). */
    private static OperatingPoint resistive(AcSource s, ResistiveLoad r) {
        boolean three = s.phases() == 3;
        double lines = three ? 3 : 1;
        double cable = three ? r.acCable().lineResistanceOhm() : r.acCable().pairResistanceOhm();
        double winding = s.starResistanceOhm();
        double x = s.angularFrequencyRadPerS() * s.starInductanceH();
        double current = s.starEmfRmsV() / Math.hypot(winding + cable + r.resistancePerPhaseOhm(), x);
        double i2 = lines * current * current;
        double terminal = current * (cable + r.resistancePerPhaseOhm()) * (three ? SQRT3 : 1);
        double phase = s.connection() == Connection.DELTA ? current / SQRT3 : current;
        double load = r.resistancePerPhaseOhm() * i2;
        return new OperatingPoint(ConductionMode.SINUSOIDAL_RESISTIVE, terminal, phase, Math.sqrt(2) * phase,
                current, Math.sqrt(2) * current, (winding + cable + r.resistancePerPhaseOhm()) * i2, load,
                winding * i2, cable * i2, 0, 0, 0, 0, 0, 0, 0, 360, 0);
    }
}
