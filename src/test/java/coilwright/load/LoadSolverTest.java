package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class LoadSolverTest {
    private static final Cable AC = new Cable(10, 4e-6, 40);
    private static final Cable DC = new Cable(5, 16e-6, 30);
    private static final BatteryLoad BATTERY_3PH = new BatteryLoad(
            Battery.of(Chemistry.LEAD_ACID, 24, ChargeStage.ABSORB).withInternalResistanceOhm(0.02),
            new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), AC, DC);

    @Test
    void resistive_load_follows_the_phasor_solution_and_balances_power() {
        AcSource src = new AcSource(3, Connection.STAR, 40, 50, 0.5, 0.004);
        OperatingPoint p = LoadSolver.solve(src, new ResistiveLoad(5, AC));
        double rTotal = 0.5 + AC.lineResistanceOhm() + 5;
        double i = 40 / Math.hypot(rTotal, 2 * Math.PI * 50 * 0.004);
        assertEquals(i, p.lineCurrentRmsA(), 1e-12);
        assertEquals(3 * 5 * i * i, p.powerToLoadW(), 1e-9);
        assertEquals(p.powerFromEmfW(), p.powerToLoadW() + p.totalLossW(), 1e-9 * p.powerFromEmfW());
        assertEquals(Math.sqrt(3) * i * (5 + AC.lineResistanceOhm()), p.lineToLineTerminalVoltageRmsV(), 1e-9);
        assertEquals(ConductionMode.SINUSOIDAL_RESISTIVE, p.mode());
    }

    @Test
    void delta_winding_gives_the_same_terminal_behaviour_as_its_equivalent_star() {
        AcSource delta = new AcSource(3, Connection.DELTA, 60 * Math.sqrt(3), 60, 0.9, 0.006);
        AcSource star = new AcSource(3, Connection.STAR, 60, 60, 0.3, 0.002);
        OperatingPoint d = LoadSolver.solve(delta, BATTERY_3PH);
        OperatingPoint s = LoadSolver.solve(star, BATTERY_3PH);
        assertEquals(s.dcCurrentA(), d.dcCurrentA(), 1e-9 * s.dcCurrentA());
        assertEquals(s.windingCopperLossW(), d.windingCopperLossW(), 1e-9 * s.windingCopperLossW());
        assertEquals(d.lineCurrentRmsA() / Math.sqrt(3), d.phaseCurrentRmsA(), 1e-12);
        assertTrue(d.phaseCurrentPeakA() < d.lineCurrentPeakA());
    }

    @Test
    void battery_load_balances_energy_including_cables_and_internal_resistance() {
        OperatingPoint p = LoadSolver.solve(new AcSource(3, Connection.STAR, 40, 50, 0.3, 0.002), BATTERY_3PH);
        assertTrue(p.acCableLossW() > 0 && p.dcCableLossW() > 0 && p.batteryInternalLossW() > 0 && p.diodeLossW() > 0);
        assertEquals(p.powerFromEmfW(), p.powerToLoadW() + p.totalLossW(), 1e-9 * p.powerFromEmfW());
        assertEquals(57.6, p.batteryVoltageV(), 1e-12);
    }

    @Test
    void rejects_a_bridge_that_does_not_match_the_source() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> LoadSolver.solve(new AcSource(1, Connection.STAR, 40, 50, 0.3, 0.002), BATTERY_3PH));
        assertEquals("rectifier.type", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> LoadSolver.solve(null, BATTERY_3PH));
    }

    /**
     * The fundamental-frequency resistive equivalent of a bridge and battery (the bridge input taken as a
     * resistor whose fundamental voltage is V_ph1 = pi*V0/(3*sqrt(6)) in phase with the current) is a common
     * shortcut. Near cut-in it misses badly: this documents by how much against the exact periodic solution.
     */
    @Test
    void fundamental_resistive_shortcut_is_off_by_tens_of_percent_near_cut_in() {
        double r = 0.3;
        double x = 2 * Math.PI * 50 * 0.002;
        double v0 = 24 + 1.6;
        double cutInEmf = v0 / Math.sqrt(6);
        double e = 1.1 * cutInEmf;
        BridgeOperatingPoint exact = BridgeSolver.solve(
                new BridgeCircuit(BridgeType.THREE_PHASE_BRIDGE, e, 50, r, 0, 0.002, 24, 0.8, 0, 0));
        double v1 = Math.PI * v0 / (3 * Math.sqrt(6));
        // |E|^2 = (V1 + R I)^2 + (X I)^2, solved for the fundamental current I
        double a = r * r + x * x;
        double b = 2 * v1 * r;
        double c = v1 * v1 - e * e;
        double i1 = Math.max(0, (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a));
        double shortcutIdc = 3 * v1 * i1 / v0;
        double relativeError = Math.abs(shortcutIdc - exact.dcCurrentA()) / exact.dcCurrentA();
        assertTrue(relativeError > 0.2, "shortcut " + shortcutIdc + " A vs exact " + exact.dcCurrentA() + " A");
    }

    @Test
    void a_sweep_in_speed_order_gives_the_single_point_answers_for_every_load_and_connection() {
        BatteryLoad single = new BatteryLoad(Battery.of(Chemistry.LIFEPO4, 4, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.SINGLE_PHASE_BRIDGE, DiodeType.SCHOTTKY), AC, DC);
        Object[][] cases = {
                {new AcSource(3, Connection.STAR, 1, 1, 0.3, 0.002), BATTERY_3PH},
                {new AcSource(3, Connection.DELTA, 1, 1, 0.9, 0.006), BATTERY_3PH},
                {new AcSource(1, Connection.STAR, 1, 1, 0.4, 0.003), single},
                {new AcSource(3, Connection.DELTA, 1, 1, 0.9, 0.006), new ResistiveLoad(3, AC)},
                {new AcSource(1, Connection.STAR, 1, 1, 0.4, 0.003), new ResistiveLoad(3, AC)}};
        for (Object[] c : cases) {
            AcSource ref = (AcSource) c[0];
            Load load = (Load) c[1];
            LoadSolver.Sweep sweep = LoadSolver.sweep(ref, load);
            for (int i = 1; i <= 60; i++) {
                double f = 2.5 * i;
                double e = 1.1 * f;
                OperatingPoint cold = LoadSolver.solve(ref.withEmfAndFrequency(e, f), load);
                OperatingPoint warm = sweep.solveAt(e, f);
                String at = load.getClass().getSimpleName() + " " + ref.connection() + " at " + f + " Hz";
                assertEquals(cold.mode(), warm.mode(), at);
                assertEquals(cold.dcCurrentA(), warm.dcCurrentA(), 1e-9 * Math.max(cold.dcCurrentA(), 1e-6), at);
                assertEquals(cold.phaseCurrentRmsA(), warm.phaseCurrentRmsA(), 1e-9 * cold.phaseCurrentRmsA() + 1e-15, at);
                assertEquals(cold.phaseCurrentPeakA(), warm.phaseCurrentPeakA(), 1e-9 * cold.phaseCurrentPeakA() + 1e-15, at);
                assertEquals(cold.powerToLoadW(), warm.powerToLoadW(), 1e-9 * cold.powerToLoadW() + 1e-15, at);
                assertEquals(cold.lineToLineTerminalVoltageRmsV(), warm.lineToLineTerminalVoltageRmsV(),
                        1e-9 * cold.lineToLineTerminalVoltageRmsV(), at);
                assertEquals(cold.dcCurrentA() > 0, sweep.conductsAt(e, f) && cold.dcCurrentA() > 0, at);
            }
        }
    }

    @Test
    void a_sweep_solving_one_speed_at_several_winding_temperatures_gives_the_single_point_answers() {
        // the loss model solves each speed at several winding temperatures on one sweep (speeds repeat in the warm
        // start's history); each answer must equal a cold solve of its own circuit
        AcSource ref = new AcSource(3, Connection.DELTA, 1, 1, 0.9, 0.006);
        LoadSolver.Sweep sweep = LoadSolver.sweep(ref, BATTERY_3PH);
        for (double scale : new double[]{1.0, 1.3, 1.15, 1.3, 0.9}) {
            for (double f : new double[]{40, 60}) {
                double e = 30 * f / 40;
                OperatingPoint warm = sweep.solveAt(e, f, scale);
                AcSource hot = new AcSource(3, Connection.DELTA, e, f, 0.9 * scale, 0.006);
                OperatingPoint cold = LoadSolver.solve(hot, BATTERY_3PH);
                String at = f + " Hz, resistance x" + scale;
                assertEquals(cold.dcCurrentA(), warm.dcCurrentA(), 1e-9 * Math.max(cold.dcCurrentA(), 1e-6), at);
                assertEquals(cold.windingCopperLossW(), warm.windingCopperLossW(),
                        1e-9 * cold.windingCopperLossW() + 1e-15, at);
            }
        }
        assertThrows(InvalidInputException.class, () -> sweep.solveAt(30, 40, 0.01));
    }

    @Test
    void a_sweep_names_an_out_of_range_emf_or_frequency_like_the_source_does() {
        LoadSolver.Sweep sweep = LoadSolver.sweep(new AcSource(3, Connection.STAR, 1, 1, 0.3, 0.002), BATTERY_3PH);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> sweep.solveAt(-1, 50));
        assertEquals("emfPhaseRmsV", e.errors().get(0).field());
        InvalidInputException f = assertThrows(InvalidInputException.class, () -> sweep.conductsAt(10, Double.NaN));
        assertEquals("frequencyHz", f.errors().get(0).field());
        InvalidInputException mismatch = assertThrows(InvalidInputException.class,
                () -> LoadSolver.sweep(new AcSource(1, Connection.STAR, 1, 1, 0.3, 0.002), BATTERY_3PH));
        assertEquals("rectifier.type", mismatch.errors().get(0).field());
    }
}
