package coilwright.machine;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireSpec;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;

/** Invented designs for tests (not real products). */
public final class SampleDesigns {
    private SampleDesigns() {
    }

    /** Axial-flux dual rotor, 12 air-cored coils under 16 poles, for a small wind rotor on 24 V. */
    public static AlternatorSpec axial24V() {
        return new AlternatorSpec(
                new WindingSpec(12, 16, 3, Layers.DOUBLE, 0, 1, 0),
                36, Connection.STAR,
                new AxialDualRotor("N42", 0.040, 0.050, 0.150, 0.010, 0.013, 0.0015),
                new AirCoredStator(0.016, 0.035, 0.010),
                new WireSpec(coilwright.conductor.WireGauge.AWG, 14, 0, 2, 1),
                Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 60, 40, 0, 0);
    }

    /** Radial inner-rotor machine, 36 slots and 12 poles, a re-magnetised motor stator on 12 V. */
    public static AlternatorSpec radial12V() {
        return new AlternatorSpec(
                new WindingSpec(36, 12, 3, Layers.SINGLE, 0, 1, 0),
                12, Connection.STAR,
                new RadialSurfaceRotor(RotorSide.INNER, "N42", 0.100, 0.080, 0.001, 0.005, 0.75, 0.0025),
                new SlottedStator(0.014, 0.0045, 0.001, 0.0002, 0.005),
                new WireSpec(coilwright.conductor.WireGauge.AWG, 17, 0, 2, 2),
                Cooling.ENCLOSED_NATURAL, ThermalClass.F, 80, 50, 0, 0);
    }
}
