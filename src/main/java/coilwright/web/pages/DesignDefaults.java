package coilwright.web.pages;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireSpec;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.load.ResistiveLoad;
import coilwright.machine.AirCoredStator;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.machine.SlottedStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.web.units.Units;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import java.util.HashMap;
import java.util.Map;

/**
 * What a fresh design form shows: an axial-flux machine for a small wind rotor charging 24 V (invented values of
 * a common home-built size), and for the groups it does not use (radial rotor, slotted stator, resistor load)
 * values of a small radial machine, so switching the topology or load never meets empty fields.
 */
final class DesignDefaults {
    static final EvaluationRequest AXIAL_BATTERY = new EvaluationRequest(
            new AlternatorSpec(new WindingSpec(9, 12, 3, Layers.DOUBLE, 0, 1, 0.0), 40, Connection.STAR,
                    new AxialDualRotor("N42", 0.046, 0.030, 0.13, 0.010, 0.012, 0.0015),
                    new AirCoredStator(0.015, 0.030, 0.010), WireSpec.awg(15, 2), Cooling.AIR_COOLED_AXIAL_OPEN_COIL,
                    ThermalClass.H, 60, 40, 0, 0),
            new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                    new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), new Cable(20, 6e-6, 25),
                    new Cable(2, 16e-6, 25)),
            new SpeedRange(0, 500, 101), 400, 700);

    static final EvaluationRequest RADIAL_RESISTOR = new EvaluationRequest(
            new AlternatorSpec(new WindingSpec(18, 16, 3, Layers.DOUBLE, 0, 1, 0.0), 20, Connection.STAR,
                    new RadialSurfaceRotor(RotorSide.INNER, "N42", 0.10, 0.05, 0.001, 0.005, 0.8, 0.0025),
                    new SlottedStator(0.015, 0.006, 0.001, 0.0002, 0.005), WireSpec.awg(18, 2), Cooling.ENCLOSED_NATURAL,
                    ThermalClass.F, 80, 50, 0, 0),
            new ResistiveLoad(6.0, new Cable(10, 2.5e-6, 25)),
            new SpeedRange(0, 1000, 101), 750, 1500);

    private DesignDefaults() {
    }

    /** Form values for a design: every group filled, the design's own values on top. */
    static Map<String, String> formValues(EvaluationRequest design, Units units) {
        Map<String, String> values = new HashMap<>(DesignForm.values(RADIAL_RESISTOR, units));
        values.putAll(DesignForm.values(AXIAL_BATTERY, units));
        values.putAll(DesignForm.values(design, units));
        return values;
    }
}
