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

    /**
     * A solver for one alternator and load at many speeds, where only the EMF and the frequency change: the
     * load's constants (cable resistances at temperature) are worked out once, and each battery point starts
     * from the previous one's periodic solution (see {@link #solve(AcSource, Load)} for the method; the answers
     * agree with it to the solver's tolerance, about 1e-12 relative). Solve in speed order for the most benefit.
     * Not thread-safe: one sweep per thread.
     *
     * @param reference the alternator at any speed (its phases, connection, resistance and inductance are used)
     * @param load      a {@link BatteryLoad} or a {@link ResistiveLoad}
     * @return the sweep
     * @throws InvalidInputException when the bridge does not match the source's phase count
     */
    public static Sweep sweep(AcSource reference, Load load) {
        new Checks().present("reference", reference).present("load", load).throwIfAny();
        return new Sweep(reference, load);
    }

    /** One source and load solved at many speeds; see {@link LoadSolver#sweep(AcSource, Load)}. */
    public static final class Sweep {
        private final AcSource reference;
        private final BatteryLoad battery;
        private final ResistiveLoad resistive;
        private final boolean delta;
        private final double starResistanceOhm;
        private final double starInductanceH;
        private final double acCableOhm;
        private final double dcCableOhm;
        private final BridgeWarmStart warm = new BridgeWarmStart();

        private Sweep(AcSource reference, Load load) {
            this.reference = reference;
            this.delta = reference.connection() == Connection.DELTA;
            this.starResistanceOhm = reference.starResistanceOhm();
            this.starInductanceH = reference.starInductanceH();
            if (load instanceof BatteryLoad b) {
                circuit(reference, b);
                battery = b;
                resistive = null;
                acCableOhm = b.acCable().lineResistanceOhm();
                dcCableOhm = b.dcCable().pairResistanceOhm();
            } else {
                battery = null;
                resistive = (ResistiveLoad) load;
                acCableOhm = reference.phases() == 3 ? resistive.acCable().lineResistanceOhm()
                        : resistive.acCable().pairResistanceOhm();
                dcCableOhm = 0;
            }
        }

        /**
         * The operating point at a phase EMF and frequency, warm-started from the previous call.
         *
         * @param emfPhaseRmsV winding phase EMF, V rms, 0 to 1e6
         * @param frequencyHz  electrical frequency, > 0 and <= 1e5 Hz
         * @throws InvalidInputException when either is out of range
         */
        public OperatingPoint solveAt(double emfPhaseRmsV, double frequencyHz) {
            check(emfPhaseRmsV, frequencyHz);
            if (battery == null) {
                return resistive(reference.phases(), reference.connection(), starEmf(emfPhaseRmsV),
                        2 * Math.PI * frequencyHz, starResistanceOhm, starInductanceH, acCableOhm,
                        resistive.resistancePerPhaseOhm());
            }
            BridgeCircuit c = circuitAt(emfPhaseRmsV, frequencyHz, starResistanceOhm);
            return fromBridge(delta, BridgeSolver.solve(c, warm));
        }

        /**
         * As {@link #solveAt(double, double)} with the winding's resistance scaled (the same winding at another
         * temperature), still warm-started from the previous call.
         *
         * @param resistanceScale winding resistance / the reference's, 0.1 to 10
         * @throws InvalidInputException when an argument is out of range
         */
        public OperatingPoint solveAt(double emfPhaseRmsV, double frequencyHz, double resistanceScale) {
            check(emfPhaseRmsV, frequencyHz);
            new Checks().range("resistanceScale", resistanceScale, 0.1, 10).throwIfAny();
            double windingOhm = starResistanceOhm * resistanceScale;
            if (battery == null) {
                return resistive(reference.phases(), reference.connection(), starEmf(emfPhaseRmsV),
                        2 * Math.PI * frequencyHz, windingOhm, starInductanceH, acCableOhm,
                        resistive.resistancePerPhaseOhm());
            }
            return fromBridge(delta, BridgeSolver.solve(circuitAt(emfPhaseRmsV, frequencyHz, windingOhm), warm));
        }

        /**
         * The solver's own zero test at a phase EMF and frequency, in closed form: false exactly when
         * {@link #solveAt} would return no current. A resistive load always conducts.
         *
         * @throws InvalidInputException when either is out of range
         */
        public boolean conductsAt(double emfPhaseRmsV, double frequencyHz) {
            check(emfPhaseRmsV, frequencyHz);
            return battery == null ? emfPhaseRmsV > 0
                    : BridgeSolver.conducts(circuitAt(emfPhaseRmsV, frequencyHz, starResistanceOhm));
        }

        private BridgeCircuit circuitAt(double emfPhaseRmsV, double frequencyHz, double windingStarOhm) {
            return new BridgeCircuit(battery.rectifier().type(), starEmf(emfPhaseRmsV), frequencyHz,
                    windingStarOhm, acCableOhm, starInductanceH, battery.battery().voltageV(),
                    battery.rectifier().forwardDropV(), dcCableOhm, battery.battery().internalResistanceOhm());
        }

        /** The same expression as {@link AcSource#starEmfRmsV()}, so both paths see identical circuits. */
        private double starEmf(double emfPhaseRmsV) {
            return delta ? emfPhaseRmsV / SQRT3 : emfPhaseRmsV;
        }

        private void check(double emfPhaseRmsV, double frequencyHz) {
            if (!(emfPhaseRmsV >= 0 && emfPhaseRmsV <= 1e6 && frequencyHz > 0 && frequencyHz <= 1e5)) {
                reference.withEmfAndFrequency(emfPhaseRmsV, frequencyHz);
            }
        }
    }

    private static OperatingPoint battery(AcSource s, BatteryLoad b) {
        return fromBridge(s.connection() == Connection.DELTA, BridgeSolver.solve(circuit(s, b)));
    }

    private static OperatingPoint fromBridge(boolean delta, BridgeOperatingPoint p) {
        double phaseRms = delta ? p.lineCurrentRmsA() / SQRT3 : p.lineCurrentRmsA();
        double phasePeak = delta ? p.deltaPhaseCurrentPeakA() : p.lineCurrentPeakA();
        return new OperatingPoint(p.mode(), p.lineToLineTerminalVoltageRmsV(), phaseRms, phasePeak,
                p.lineCurrentRmsA(), p.lineCurrentPeakA(), p.powerFromEmfW(), p.powerToBatteryW(),
                p.windingCopperLossW(), p.acCableLossW(), p.dcCableLossW(), p.batteryInternalLossW(),
                p.diodeLossW(), p.dcCurrentA(), p.dcCurrentRmsA(), p.dcVoltageAtRectifierV(), p.batteryVoltageV(),
                p.conductionAngleDeg(), p.commutationOverlapDeg());
    }

    private static OperatingPoint resistive(AcSource s, ResistiveLoad r) {
        boolean three = s.phases() == 3;
        double cable = three ? r.acCable().lineResistanceOhm() : r.acCable().pairResistanceOhm();
        return resistive(s.phases(), s.connection(), s.starEmfRmsV(), s.angularFrequencyRadPerS(),
                s.starResistanceOhm(), s.starInductanceH(), cable, r.resistancePerPhaseOhm());
    }

    /** Phasor solution I = E / ((R + R_cable + R_load) + jX) per star phase (single-phase: the loop). */
    private static OperatingPoint resistive(int phases, Connection connection, double starEmfRmsV, double w,
                                            double winding, double starInductanceH, double cable, double loadOhm) {
        boolean three = phases == 3;
        double lines = three ? 3 : 1;
        double x = w * starInductanceH;
        double current = starEmfRmsV / Math.hypot(winding + cable + loadOhm, x);
        double i2 = lines * current * current;
        double terminal = current * (cable + loadOhm) * (three ? SQRT3 : 1);
        double phase = connection == Connection.DELTA ? current / SQRT3 : current;
        double load = loadOhm * i2;
        return new OperatingPoint(ConductionMode.SINUSOIDAL_RESISTIVE, terminal, phase, Math.sqrt(2) * phase,
                current, Math.sqrt(2) * current, (winding + cable + loadOhm) * i2, load,
                winding * i2, cable * i2, 0, 0, 0, 0, 0, 0, 0, 360, 0);
    }
}
