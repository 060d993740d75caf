package coilwright.machine;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireSpec;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSpec;
import coilwright.validation.Checks;
import coilwright.winding.WindingSpec;

/**
 * Everything that defines a permanent-magnet alternator: winding, rotor and magnets, stator, wire, temperatures.
 * SI units throughout.
 *
 * @param winding                slots, poles, phases, layers, pitch, parallel paths, skew
 * @param turnsPerCoil           turns of each coil (1 to 10 000)
 * @param connection             STAR or DELTA (single-phase windings must be STAR)
 * @param rotor                  radial surface-magnet rotor (with a slotted stator) or axial dual rotor (with air-cored coils)
 * @param stator                 the stator geometry matching the rotor
 * @param wire                   magnet wire and strands in hand
 * @param cooling                cooling, which sets the current-density band
 * @param insulationClass        thermal class of the magnet wire (IEC 60085)
 * @param windingTempC           working winding temperature, C (-40 to 250)
 * @param magnetTempC            working magnet temperature, C (-40 to 250)
 * @param measuredKeLineVPerRpm  a measured open-circuit line voltage per rpm (rms) that replaces the computed one; 0 = compute
 * @param phaseInductanceH       a measured phase inductance that replaces the estimate, H; 0 = estimate
 * @param ambientTempC           temperature of the air around the machine, C (-40 to 60; absent from a document:
 *                               {@link #DEFAULT_AMBIENT_TEMP_C}); the solved winding temperatures start from it
 */
public record AlternatorSpec(
        WindingSpec winding,
        int turnsPerCoil,
        Connection connection,
        RotorSpec rotor,
        StatorSpec stator,
        WireSpec wire,
        Cooling cooling,
        ThermalClass insulationClass,
        double windingTempC,
        double magnetTempC,
        double measuredKeLineVPerRpm,
        double phaseInductanceH,
        double ambientTempC) {
    /** Ambient air temperature when none is stated, C (the default; IEC 60034-1 rates machines for
     *  coolant up to 40 C, so 25 C is a mild site: common practice). */
    public static final double DEFAULT_AMBIENT_TEMP_C = 25.0;
    /** Coldest and hottest ambient air the thermal networks take, C (their air property tables' range). */
    public static final double MIN_AMBIENT_TEMP_C = -40.0;
    public static final double MAX_AMBIENT_TEMP_C = 60.0;
    /**
     * Smallest measured line EMF constant, V/rpm: 1e-4 V/rpm gives 0.1 V at 1000 rpm, below any machine that
     * charges a battery (the electrical frequency a speed implies would otherwise leave every physical range).
     */
    public static final double MIN_MEASURED_KE_V_PER_RPM = 1e-4;
    /** Smallest entered phase inductance, H (1 uH: a few turns of an air-cored coil; common practice). */
    public static final double MIN_PHASE_INDUCTANCE_H = 1e-6;

    public AlternatorSpec {
        Checks c = new Checks()
                .present("winding", winding)
                .intRange("turnsPerCoil", turnsPerCoil, 1, 10_000)
                .present("connection", connection)
                .present("rotor", rotor)
                .present("stator", stator)
                .present("wire", wire)
                .present("cooling", cooling)
                .present("insulationClass", insulationClass)
                .range("windingTempC", windingTempC, -40, 250)
                .range("magnetTempC", magnetTempC, -40, 250)
                .range("measuredKeLineVPerRpm", measuredKeLineVPerRpm, 0, 100)
                .range("phaseInductanceH", phaseInductanceH, 0, 10)
                .range("ambientTempC", ambientTempC, MIN_AMBIENT_TEMP_C, MAX_AMBIENT_TEMP_C);
        // 0 asks for the computed value; an entered one must be a machine's, not a rounding residue
        if (measuredKeLineVPerRpm > 0 && measuredKeLineVPerRpm < MIN_MEASURED_KE_V_PER_RPM) {
            c.require(false, "measuredKeLineVPerRpm", measuredKeLineVPerRpm, "must be 0 (computed) or between "
                    + MIN_MEASURED_KE_V_PER_RPM + " and 100 V/rpm", "0, or " + MIN_MEASURED_KE_V_PER_RPM + " to 100");
        }
        if (phaseInductanceH > 0 && phaseInductanceH < MIN_PHASE_INDUCTANCE_H) {
            c.require(false, "phaseInductanceH", phaseInductanceH, "must be 0 (estimated) or between "
                    + MIN_PHASE_INDUCTANCE_H + " and 10 H", "0, or " + MIN_PHASE_INDUCTANCE_H + " to 10");
        }
        if (rotor instanceof AxialDualRotor && stator != null && !(stator instanceof AirCoredStator)) {
            c.require(false, "stator", "slotted", "an axial dual rotor runs over an air-cored coil stator", "air-cored stator");
        }
        if (rotor instanceof RadialSurfaceRotor && stator != null && !(stator instanceof SlottedStator)) {
            c.require(false, "stator", "air-cored", "a radial surface-magnet rotor runs in a slotted stator", "slotted stator");
        }
        if (winding != null && connection == Connection.DELTA && winding.phases() != 3) {
            c.require(false, "connection", connection, "delta needs three phases; winding.phases = " + winding.phases(), "STAR");
        }
        c.throwIfAny();
    }

    /** A machine in the default ambient air ({@link #DEFAULT_AMBIENT_TEMP_C}). */
    public AlternatorSpec(WindingSpec winding, int turnsPerCoil, Connection connection, RotorSpec rotor,
                          StatorSpec stator, WireSpec wire, Cooling cooling, ThermalClass insulationClass,
                          double windingTempC, double magnetTempC, double measuredKeLineVPerRpm,
                          double phaseInductanceH) {
        this(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass, windingTempC,
                magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, DEFAULT_AMBIENT_TEMP_C);
    }

    public AlternatorSpec withAmbientTempC(double t) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, t);
    }

    public AlternatorSpec withTurnsPerCoil(int turns) {
        return new AlternatorSpec(winding, turns, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withConnection(Connection c) {
        return new AlternatorSpec(winding, turnsPerCoil, c, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withWinding(WindingSpec w) {
        return new AlternatorSpec(w, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withWire(WireSpec w) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, w, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withWindingTempC(double t) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                t, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withMeasuredKeLineVPerRpm(double ke) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, ke, phaseInductanceH, ambientTempC);
    }

    public AlternatorSpec withPhaseInductanceH(double l) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, l, ambientTempC);
    }
}
