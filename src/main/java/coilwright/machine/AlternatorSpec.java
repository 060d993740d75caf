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
        double phaseInductanceH) {
    /** The smallest measured Ke admitted, line V rms per rpm (0 = compute it). */
    public static final double MIN_MEASURED_KE_V_PER_RPM = 1e-4;
    /** The smallest measured phase inductance admitted, H (0 = estimate it). */
    public static final double MIN_MEASURED_INDUCTANCE_H = 1e-6;

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
                .range("phaseInductanceH", phaseInductanceH, 0, 10);
        // a measured value replaces the model's own: admitted only where the model still works (common practice: an
        // LCR meter on a small machine's winding reads microhenries at best; a Ke below 0.1 V per 1000 rpm would put
        // cut-in beyond any admitted speed). Below these the pulse integration and the speed-derived checks break down.
        if (measuredKeLineVPerRpm > 0 && measuredKeLineVPerRpm < MIN_MEASURED_KE_V_PER_RPM) {
            c.require(false, "measuredKeLineVPerRpm", measuredKeLineVPerRpm, "must be 0 (computed) or at least "
                    + MIN_MEASURED_KE_V_PER_RPM + " V/rpm", "0, or " + MIN_MEASURED_KE_V_PER_RPM + " to 100");
        }
        if (phaseInductanceH > 0 && phaseInductanceH < MIN_MEASURED_INDUCTANCE_H) {
            c.require(false, "phaseInductanceH", phaseInductanceH, "must be 0 (estimated) or at least "
                    + MIN_MEASURED_INDUCTANCE_H + " H", "0, or " + MIN_MEASURED_INDUCTANCE_H + " to 10");
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

    public AlternatorSpec withTurnsPerCoil(int turns) {
        return new AlternatorSpec(winding, turns, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH);
    }

    public AlternatorSpec withConnection(Connection c) {
        return new AlternatorSpec(winding, turnsPerCoil, c, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH);
    }

    public AlternatorSpec withWinding(WindingSpec w) {
        return new AlternatorSpec(w, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH);
    }

    public AlternatorSpec withWire(WireSpec w) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, w, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH);
    }

    public AlternatorSpec withWindingTempC(double t) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                t, magnetTempC, measuredKeLineVPerRpm, phaseInductanceH);
    }

    public AlternatorSpec withMeasuredKeLineVPerRpm(double ke) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, ke, phaseInductanceH);
    }

    public AlternatorSpec withPhaseInductanceH(double l) {
        return new AlternatorSpec(winding, turnsPerCoil, connection, rotor, stator, wire, cooling, insulationClass,
                windingTempC, magnetTempC, measuredKeLineVPerRpm, l);
    }
}
