package coilwright.system;

import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.SampleDesigns;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroSite;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.PenstockSpec;
import coilwright.turbine.PipeMaterial;
import coilwright.turbine.WindRotor;

import java.util.List;

/** Invented systems for the matching tests. */
final class MatchFixtures {
    static final BatteryLoad BATTERY_24V = new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
            new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), new Cable(30, 6e-6, 30), new Cable(3, 16e-6, 25));
    static final BatteryLoad BATTERY_48V = new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 24, ChargeStage.NOMINAL),
            new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), new Cable(20, 6e-6, 30), new Cable(3, 16e-6, 25));
    static final Alternator AXIAL = AlternatorModel.build(SampleDesigns.axial24V());

    private MatchFixtures() {
    }

    /** A 3.6 m three-blade rotor, Cp 0.42 at tip-speed ratio 6.5, 500 rpm furling, direct drive. */
    static WindRotor rotor() {
        return new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 500, 1.0, 1.0);
    }

    static WindMatchRequest windRequest(WindRotor rotor) {
        return new WindMatchRequest(SampleDesigns.axial24V(), BATTERY_24V, rotor, WindSite.standard(),
                WindRegime.rayleigh(5.0), 25.0);
    }

    static HydroMatchRequest hydroRequest(HydroSite site, RunnerDesign runner) {
        return new HydroMatchRequest(SampleDesigns.axial24V(), BATTERY_48V, site,
                PenstockSpec.of(120, 0.1, PipeMaterial.HDPE, 2.0), runner, 1.0, 0.95, 10.0);
    }

    static HydroSite site() {
        return new HydroSite(25.0, 0.015, List.of());
    }

    static RunnerDesign impulseFor(double targetSpeedRpm) {
        return new RunnerDesign(RunnerKind.IMPULSE, 2, 0.0, targetSpeedRpm, 0.0);
    }
}
