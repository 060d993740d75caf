package coilwright.system;

import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.load.ResistiveLoad;
import coilwright.machine.SampleDesigns;
import coilwright.safety.Caution;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AlternatorEvaluatorTest {

    static BatteryLoad battery24() {
        return new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), new Cable(30, 6e-6, 30), new Cable(3, 16e-6, 25));
    }

    static EvaluationRequest axial(double maxSpeed) {
        return new EvaluationRequest(SampleDesigns.axial24V(), battery24(), new SpeedRange(0, 500, 51), 350, maxSpeed);
    }

    @Test
    void the_speed_sweep_checks_the_time_budget_once_per_point() throws Exception {
        EvaluationRequest big = new EvaluationRequest(SampleDesigns.axial24V(), battery24(), new SpeedRange(0, 500, 1000), 350, 600);
        try (coilwright.validation.TimeBudget b = coilwright.validation.TimeBudget.open(1)) {
            Thread.sleep(5);
            coilwright.validation.SolverFailedException e = assertThrows(coilwright.validation.SolverFailedException.class,
                    () -> AlternatorEvaluator.evaluate(big));
            assertEquals("speedRange.points", e.field());
        }
        assertEquals(1000, AlternatorEvaluator.evaluate(big).points().size(), "without a budget it runs to the end");
    }

    @Test
    void closed_form_and_solved_cut_in_agree() {
        AlternatorEvaluation e = AlternatorEvaluator.evaluate(axial(600));
        assertTrue(e.cutInSpeedRpm() > 50 && e.cutInSpeedRpm() < 300, "plausible cut-in " + e.cutInSpeedRpm());
        assertEquals(e.cutInSpeedRpm(), e.cutInSpeedSolvedRpm(), 1e-3 * e.cutInSpeedRpm());
        // sqrt(2) * E_LL at cut-in = battery + two diode drops
        double eLine = e.alternator().emfLineRmsV(e.cutInSpeedRpm());
        assertEquals(24.0 + 2 * 0.8, Math.sqrt(2) * eLine, 1e-9);
    }

    @Test
    void the_table_has_one_point_per_speed_and_the_rated_point_is_at_rated_speed() {
        AlternatorEvaluation e = AlternatorEvaluator.evaluate(axial(600));
        assertEquals(51, e.points().size());
        assertEquals(0.0, e.points().get(0).speedRpm());
        assertEquals(500.0, e.points().get(50).speedRpm(), 1e-12);
        assertEquals(350.0, e.rated().speedRpm());
        assertTrue(e.rated().powerToLoadW() > 0);
        assertTrue(e.peakOutput().orElseThrow().powerToLoadW() >= e.rated().powerToLoadW());
    }

    @Test
    void open_circuit_voltage_is_checked_at_the_maximum_speed_or_twice_rated() {
        AlternatorEvaluation given = AlternatorEvaluator.evaluate(axial(600));
        assertEquals(600, given.maxSpeedRpm());
        assertEquals(given.alternator().emfLineRmsV(600), given.openCircuitLineRmsVAtMaxSpeed(), 1e-9);
        AlternatorEvaluation doubled = AlternatorEvaluator.evaluate(axial(0));
        assertEquals(700, doubled.maxSpeedRpm());
        Caution oc = doubled.cautions().stream().filter(c -> c.code().equals("OPEN_CIRCUIT_VOLTAGE")).findFirst().orElseThrow();
        assertTrue(oc.message().contains("twice the rated speed"), oc.message());
    }

    @Test
    void battery_results_carry_the_battery_cautions() {
        AlternatorEvaluation e = AlternatorEvaluator.evaluate(axial(600));
        assertTrue(e.cautions().stream().anyMatch(c -> c.code().equals("DIVERSION_LOAD")));
        assertTrue(e.cautions().stream().anyMatch(c -> c.code().equals("BATTERY_VENTILATION")));
        assertTrue(e.cautions().stream().anyMatch(c -> c.code().equals("MAGNET_HANDLING")));
    }

    @Test
    void resistive_load_has_no_cut_in_and_takes_current_at_any_speed() {
        EvaluationRequest r = new EvaluationRequest(SampleDesigns.axial24V(), new ResistiveLoad(2.0, new Cable(10, 4e-6, 25)),
                new SpeedRange(0, 300, 4), 0, 0);
        AlternatorEvaluation e = AlternatorEvaluator.evaluate(r);
        assertEquals(0.0, e.cutInSpeedRpm());
        assertTrue(e.points().get(1).phaseCurrentRmsA() > 0);
        assertEquals(300.0, e.rated().speedRpm());
    }

    @Test
    void a_reversed_or_empty_speed_range_is_refused_naming_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SpeedRange(500, 100, 10));
        assertEquals("maxRpm", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("empty or reversed"));
        assertThrows(InvalidInputException.class, () -> new SpeedRange(100, 100, 10));
        assertEquals("points", assertThrows(InvalidInputException.class, () -> new SpeedRange(0, 100, 1)).errors().get(0).field());
    }
}
