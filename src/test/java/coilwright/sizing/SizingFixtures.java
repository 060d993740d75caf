package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;
import coilwright.machine.SlottedStator;
import coilwright.magnet.RotorSide;
import coilwright.system.RunnerDesign;
import coilwright.system.RunnerKind;
import coilwright.system.WindRegime;
import coilwright.system.WindSite;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroSite;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.PenstockSpec;
import coilwright.turbine.PipeMaterial;
import coilwright.turbine.WindRotor;
import coilwright.winding.Layers;

import java.util.List;

/**
 * Invented sizing requests resembling the three demo scenarios in {@code examples/} (axial wind 24 V, radial hydro
 * 48 V, rewound motor 12 V), and small variants for brute-force comparisons.
 */
final class SizingFixtures {
    private SizingFixtures() {
    }

    static BatteryLoad leadAcid24V() {
        return new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 0.8), new Cable(30, 1e-5, 30),
                new Cable(3, 2.5e-5, 25));
    }

    static BatteryLoad lifepo48V() {
        return new BatteryLoad(Battery.of(Chemistry.LIFEPO4, 16, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SCHOTTKY, 0.45), new Cable(80, 1.6e-5, 25),
                new Cable(2, 2.5e-5, 25));
    }

    static BatteryLoad leadAcid12V() {
        return new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 6, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SCHOTTKY, 0.45), new Cable(15, 1.6e-5, 30),
                new Cable(2, 2.5e-5, 25));
    }

    /** A 3 m three-blade rotor furling at 500 rpm, direct drive, on a 5 m/s Rayleigh site at sea level. */
    static WindDrive wind3m() {
        return new WindDrive(new WindRotor(3.0, 3, new ParametricCp(0.40, 6.5), 500, 1.0, 1.0), WindSite.standard(),
                WindRegime.rayleigh(5.0), 25, 10);
    }

    /** A 2 m rotor furling at 600 rpm, direct drive, on a 4.5 m/s site, rated at 8 m/s. */
    static WindDrive wind2m() {
        return new WindDrive(new WindRotor(2.0, 3, new ParametricCp(0.38, 6.0), 600, 1.0, 1.0), WindSite.standard(),
                WindRegime.rayleigh(4.5), 25, 8);
    }

    /** A two-jet impulse runner sized for 375 rpm on 30 m gross head, 12 L/s, belted up 2:1, with a flow-duration curve. */
    static HydroDrive hydro() {
        HydroSite site = new HydroSite(30.0, 0.012, List.of(new FlowDurationPoint(0.030, 0),
                new FlowDurationPoint(0.015, 30), new FlowDurationPoint(0.010, 60), new FlowDurationPoint(0.006, 90),
                new FlowDurationPoint(0.004, 100)));
        return new HydroDrive(site, PenstockSpec.of(150, 0.1, PipeMaterial.HDPE, 2.0),
                new RunnerDesign(RunnerKind.IMPULSE, 2, 0.0, 375, 0.0), 2.0, 0.95, 10.0);
    }

    static AxialBuild axialBuild(List<Double> discs, int minPoles, int maxPoles) {
        return new AxialBuild(discs, 0.01, List.of(0.013, 0.018), 0.0015, 0.001, minPoles, maxPoles,
                List.of(new MagnetOption("N42", 0.040, 0.050, 0.010, List.of(1))), 40);
    }

    static WindingChoices axialWinding(int minTurns, int maxTurns, int thickestAwg, int thinnestAwg, int strands) {
        return new WindingChoices(minTurns, maxTurns, WireRange.awg(thickestAwg, thinnestAwg, strands),
                List.of(Connection.STAR, Connection.DELTA), 2, 0.85, Cooling.AIR_COOLED_AXIAL_OPEN_COIL,
                ThermalClass.H, 70);
    }

    /** The 24-slot, 140 mm bore, 80 mm stack lamination of the hydro demo. */
    static RadialBuild hydroStator(int minPoles, int maxPoles) {
        return new RadialBuild(RotorSide.INNER, 0.14, 0.08, 24, new SlottedStator(0.024, 0.008, 0.0015, 0.0002, 0.006),
                0.001, 0.0025, List.of(Layers.DOUBLE), minPoles, maxPoles,
                List.of(new MagnetOption("N42SH", 0.010, 0.040, 0.004, List.of(1, 2))), 60);
    }

    /** The 36-slot, 100 mm bore motor stator of the rewind demo. */
    static RadialBuild motorStator(int minPoles, int maxPoles) {
        return new RadialBuild(RotorSide.INNER, 0.10, 0.08, 36, new SlottedStator(0.014, 0.0045, 0.001, 0.0002, 0.005),
                0.001, 0.0025, List.of(Layers.SINGLE, Layers.DOUBLE), minPoles, maxPoles,
                List.of(new MagnetOption("N42", 0.0095, 0.040, 0.005, List.of(1, 2))), 50);
    }

    static WindingChoices radialWinding(int minTurns, int maxTurns, int thickestAwg, int thinnestAwg, int strands,
                                        Cooling cooling) {
        return new WindingChoices(minTurns, maxTurns, WireRange.awg(thickestAwg, thinnestAwg, strands),
                List.of(Connection.STAR, Connection.DELTA), 2, 0.85, cooling, ThermalClass.F, 90);
    }

    static SizingRequest axialWind24V() {
        return new SizingRequest(wind3m(), leadAcid24V(), axialBuild(List.of(0.36, 0.39, 0.42), 12, 20),
                axialWinding(10, 120, 12, 20, 3), new Limits(0, 0, 0, 0, 3.5), Objective.ANNUAL_ENERGY,
                new MaterialPrices(15, 60, 8), 5, 2000);
    }

    static SizingRequest radialHydro48V() {
        return new SizingRequest(hydro(), lifepo48V(), hydroStator(16, 28),
                radialWinding(2, 40, 14, 20, 3, Cooling.OPEN_VENTILATED), new Limits(0, 0, 0.8, 0, 0),
                Objective.ANNUAL_ENERGY, new MaterialPrices(15, 60, 8), 5, 2000);
    }

    static SizingRequest rewoundMotor12V() {
        return new SizingRequest(wind2m(), leadAcid12V(), motorStator(8, 16),
                radialWinding(2, 40, 14, 22, 3, Cooling.ENCLOSED_NATURAL), new Limits(0, 0, 0, 0, 3.5),
                Objective.ANNUAL_ENERGY, new MaterialPrices(15, 60, 8), 5, 2000);
    }

    /** A small axial wind space: one disc and stator, 16 poles, a few turns and wires. */
    static SizingRequest smallAxialWind(Objective objective) {
        AxialBuild build = new AxialBuild(List.of(0.39), 0.01, List.of(0.016), 0.0015, 0.001, 16, 16,
                List.of(new MagnetOption("N42", 0.040, 0.050, 0.010, List.of(1))), 40);
        WindingChoices w = new WindingChoices(16, 24, WireRange.awg(13, 13, 2), List.of(Connection.STAR,
                Connection.DELTA), 1, 0.93, Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 70);
        return new SizingRequest(wind3m(), leadAcid24V(), build, w, new Limits(0, 0, 0, 0, 3.5), objective,
                new MaterialPrices(15, 60, 8), 3, 10_000);
    }

    /** A small axial space on speed targets: start charging by 180 rpm, 600 W at 350 rpm. */
    static SizingRequest smallAxialSpeed(Objective objective, Limits limits) {
        AxialBuild build = new AxialBuild(List.of(0.40), 0.01, List.of(0.016), 0.0015, 0.001, 12, 16,
                List.of(new MagnetOption("N42", 0.040, 0.050, 0.010, List.of(1))), 40);
        WindingChoices w = new WindingChoices(20, 60, WireRange.awg(13, 16, 2), List.of(Connection.STAR,
                Connection.DELTA), 2, 0.9, Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 70);
        return new SizingRequest(new SpeedTargets(180, 300, 400, 600), leadAcid24V(), build, w, limits, objective,
                new MaterialPrices(15, 60, 8), 4, 100_000);
    }

    /** A small radial space on speed targets in the motor stator: 12 V, charging by 150 rpm, 250 W at 300 rpm. */
    static SizingRequest smallRadialSpeed(Objective objective, Limits limits) {
        return new SizingRequest(new SpeedTargets(150, 250, 120, 500), leadAcid12V(), motorStator(8, 12),
                radialWinding(4, 20, 16, 18, 2, Cooling.ENCLOSED_NATURAL), limits, objective,
                new MaterialPrices(15, 60, 8), 4, 100_000);
    }

    /** A small hydro space in the 24-slot stator. */
    static SizingRequest smallRadialHydro(Objective objective) {
        RadialBuild build = new RadialBuild(RotorSide.INNER, 0.14, 0.08, 24,
                new SlottedStator(0.024, 0.008, 0.0015, 0.0002, 0.006), 0.001, 0.0025, List.of(Layers.DOUBLE), 20, 20,
                List.of(new MagnetOption("N42SH", 0.010, 0.040, 0.004, List.of(1, 2))), 60);
        WindingChoices w = new WindingChoices(6, 16, WireRange.awg(15, 16, 2), List.of(Connection.STAR,
                Connection.DELTA), 1, 0.9, Cooling.OPEN_VENTILATED, ThermalClass.F, 90);
        return new SizingRequest(hydro(), lifepo48V(), build, w, Limits.defaults(), objective,
                new MaterialPrices(15, 60, 8), 3, 10_000);
    }
}
