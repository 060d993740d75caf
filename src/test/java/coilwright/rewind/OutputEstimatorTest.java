package coilwright.rewind;

import coilwright.load.AcSource;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.DiodeType;
import coilwright.load.LoadSolver;
import coilwright.load.OperatingPoint;
import coilwright.load.Rectifier;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.SampleDesigns;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class OutputEstimatorTest {

    /** The sample machine measured, with its line-to-line inductance read as well. */
    static ExistingMachine withInductance(Alternator a) {
        ExistingMachine m = MeasuredMachines.existing(a, 16);
        return new ExistingMachine(m.slots(), m.poles(), m.phases(), m.layers(), m.coilPitchSlots(), m.connection(),
                0, m.parallelPaths(), m.turnsPerCoil(), m.wire(), null,
                m.measurements().withLineInductanceH(2 * a.phaseInductanceH()));
    }

    static OperatingPoint solved(Alternator a, double speedRpm, double batteryV) {
        AcSource s = new AcSource(3, a.spec().connection(), a.emfPhaseRmsV(speedRpm), a.frequencyHz(speedRpm),
                a.phaseResistanceHotOhm(), a.phaseInductanceH());
        return LoadSolver.solve(s, new BatteryLoad(Battery.custom(batteryV),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 0.8), Cable.NONE, Cable.NONE));
    }

    @Test
    void present_connection_output_matches_the_load_solver_on_the_modelled_machine() {
        Alternator a = MeasuredMachines.axial(36);
        RewindPlan plan = RewindPlanner.plan(withInductance(a), RewindTarget.battery(24, 150, 400));
        OutputEstimate out = plan.reconnections().stream().filter(Reconnection::unchanged).findFirst().orElseThrow()
                .output().orElseThrow();
        OperatingPoint p = solved(a, 400, 24);
        assertTrue(p.dcCurrentA() > 0, "above cut-in at 400 rpm");
        assertEquals(p.dcCurrentA(), out.dcCurrentA(), 1e-6 * p.dcCurrentA());
        assertEquals(p.windingCopperLossW(), out.copperLossW(), 1e-6 * p.windingCopperLossW());
        assertEquals(p.powerToLoadW(), out.powerToBatteryW(), 1e-6 * p.powerToLoadW());
        assertEquals(a.frequencyHz(400), out.frequencyHz(), 1e-12);
    }

    @Test
    void rewound_output_matches_the_model_of_the_rewound_machine_within_half_a_percent() {
        Alternator wanted = MeasuredMachines.axial(36);
        RewindPlan plan = RewindPlanner.plan(withInductance(MeasuredMachines.axial(24)),
                RewindTarget.battery(24, CutInSpeed.speedRpm(wanted.keLineRmsVPerRpm(), 24, 0.8), 400));
        RewindOption best = plan.rewinds().get(0);
        assertEquals(36, best.turnsPerCoil());
        WireChoice w = best.wireChoices().get(0);
        Alternator rewound = AlternatorModel.build(SampleDesigns.axial24V().withTurnsPerCoil(36).withWire(w.wire()));
        OperatingPoint p = solved(rewound, 400, 24);
        OutputEstimate out = w.output().orElseThrow();
        assertEquals(p.dcCurrentA(), out.dcCurrentA(), 0.005 * p.dcCurrentA());
        assertEquals(p.windingCopperLossW(), out.copperLossW(), 0.005 * p.windingCopperLossW());
    }

    @Test
    void below_cut_in_no_current_flows() {
        Alternator a = MeasuredMachines.axial(36);
        RewindPlan plan = RewindPlanner.plan(withInductance(a), RewindTarget.battery(48, 300, 100));
        Reconnection now = plan.reconnections().stream().filter(Reconnection::unchanged).findFirst().orElseThrow();
        assertTrue(now.achieved() > 100, "cut-in above the target speed");
        assertEquals(0.0, now.output().orElseThrow().dcCurrentA(), 1e-9);
        assertEquals(0.0, now.output().orElseThrow().copperLossW(), 1e-9);
    }

    @Test
    void without_an_inductance_reading_or_for_a_voltage_target_output_is_left_out_and_said_so() {
        RewindPlan noL = RewindPlanner.plan(MeasuredMachines.existing(MeasuredMachines.axial(36), 16),
                RewindTarget.battery(24, 150, 400));
        assertTrue(noL.reconnections().stream().allMatch(r -> r.output().isEmpty()));
        assertTrue(noL.notes().stream().anyMatch(n -> n.contains("needs the line-to-line resistance and inductance")));
        RewindPlan voltage = RewindPlanner.plan(withInductance(MeasuredMachines.axial(36)),
                RewindTarget.lineVoltage(30, 300, 400));
        assertTrue(voltage.rewinds().stream().flatMap(o -> o.wireChoices().stream()).allMatch(w -> w.output().isEmpty()));
    }

    @Test
    void inductance_scales_with_the_series_turns_squared() {
        Alternator a = MeasuredMachines.axial(36);
        RewindPlan plan = RewindPlanner.plan(withInductance(a), RewindTarget.battery(24, 150, 400));
        Reconnection twoPaths = plan.reconnections().stream()
                .filter(r -> r.parallelPaths() == 2 && r.connection() == coilwright.machine.Connection.STAR)
                .findFirst().orElseThrow();
        assertEquals(a.phaseInductanceH() / 4, twoPaths.output().orElseThrow().phaseInductanceH(), 1e-15);
    }
}
