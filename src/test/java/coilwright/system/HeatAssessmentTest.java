package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.machine.SampleDesigns;
import coilwright.safety.Caution;
import coilwright.thermal.WindingTemperature;
import java.util.List;
import org.junit.jupiter.api.Test;

class HeatAssessmentTest {
    /** Shaft power equals output plus every loss to this share of the shaft power: the rectifier solver's balance
     *  (1e-9) with room for rounding. */
    private static final double BALANCE = 1e-6;

    static BatteryLoad battery12() {
        return new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 6, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON), new Cable(10, 10e-6, 30),
                new Cable(2, 25e-6, 25));
    }

    static AlternatorEvaluation axial() {
        return AlternatorEvaluator.evaluate(AlternatorEvaluatorTest.axial(600));
    }

    static AlternatorEvaluation radial(Connection c) {
        AlternatorSpec spec = SampleDesigns.radial12V().withConnection(c);
        return AlternatorEvaluator.evaluate(new EvaluationRequest(spec, battery12(), new SpeedRange(0, 400, 41), 250, 500));
    }

    private static void assertBalanced(LossPoint p) {
        assertEquals(p.shaftPowerW(), p.powerToLoadW() + p.totalLossW(), BALANCE * Math.max(p.shaftPowerW(), 1e-9),
                () -> "energy balance at " + p);
    }

    @Test
    void shaft_power_is_output_plus_every_loss_at_every_point() {
        for (AlternatorEvaluation e : List.of(axial(), radial(Connection.STAR), radial(Connection.DELTA))) {
            e.heatAndLosses().points().forEach(HeatAssessmentTest::assertBalanced);
            assertBalanced(e.heatAndLosses().rated());
        }
    }

    @Test
    void no_loss_is_negative_and_efficiency_lies_between_zero_and_one() {
        for (LossPoint p : radial(Connection.DELTA).heatAndLosses().points()) {
            for (double loss : new double[]{p.windingCopperLossW(), p.conductorEddyLossW(), p.deltaCirculationLossW(),
                    p.statorIronLossW(), p.bearingFrictionLossW(), p.windageLossW(), p.diodeLossW(), p.cableLossW(),
                    p.batteryInternalLossW()}) {
                assertTrue(loss >= 0, () -> "negative loss at " + p);
            }
            assertTrue(p.efficiency() >= 0 && p.efficiency() < 1, () -> "efficiency at " + p);
        }
    }

    @Test
    void the_full_breakdown_lowers_efficiency_below_the_electrical_one() {
        AlternatorEvaluation e = radial(Connection.STAR);
        LossPoint rated = e.heatAndLosses().rated();
        assertTrue(rated.statorIronLossW() > 0 && rated.bearingFrictionLossW() > 0, "slotted: iron and friction count");
        assertTrue(rated.shaftPowerW() > rated.powerToLoadW() + rated.windingCopperLossW());
        assertTrue(rated.efficiency() < 1);
    }

    @Test
    void the_winding_warms_as_the_speed_and_current_rise() {
        List<LossPoint> points = axial().heatAndLosses().points();
        for (int i = 1; i < points.size(); i++) {
            assertTrue(points.get(i).windingMeanC() >= points.get(i - 1).windingMeanC() - WindingTemperature.ACCURACY_K,
                    "temperature falls between " + points.get(i - 1) + " and " + points.get(i));
        }
        assertTrue(points.get(points.size() - 1).windingMeanC() > points.get(0).windingMeanC() + 10);
    }

    @Test
    void the_copper_loss_is_that_of_the_operating_point_solved_with_the_copper_at_its_temperature() {
        AlternatorEvaluation e = axial();
        LossPoint rated = e.heatAndLosses().rated();
        coilwright.machine.Alternator alt = e.alternator();
        double speed = rated.speedRpm();
        coilwright.load.OperatingPoint op = coilwright.load.LoadSolver.solve(new coilwright.load.AcSource(3,
                alt.spec().connection(), alt.emfPhaseRmsV(speed), alt.frequencyHz(speed),
                alt.resistance().resistanceOhmAt(rated.windingMeanC()), alt.phaseInductanceH()), battery24());
        assertEquals(op.windingCopperLossW(), rated.windingCopperLossW(), 1e-9 * op.windingCopperLossW());
        assertEquals(op.powerToLoadW(), rated.powerToLoadW(), 1e-9 * op.powerToLoadW());
        assertTrue(rated.windingMeanC() > h(e).ambientC(), "a loaded winding is above ambient");
    }

    private static HeatAndLosses h(AlternatorEvaluation e) {
        return e.heatAndLosses();
    }

    private static BatteryLoad battery24() {
        return AlternatorEvaluatorTest.battery24();
    }

    @Test
    void an_air_cored_stator_has_no_cogging_no_iron_loss_and_carries_conductor_eddy_loss() {
        HeatAndLosses h = axial().heatAndLosses();
        assertEquals(0, h.cogging().peakToPeakNm());
        assertEquals(0, h.rated().statorIronLossW());
        assertTrue(h.rated().conductorEddyLossW() > 0);
        assertEquals(h.friction().breakawayTorqueNm(), h.startingTorqueNm(), 1e-12);
    }

    @Test
    void a_slotted_stator_cogs_and_needs_more_starting_torque_than_its_friction() {
        HeatAndLosses h = radial(Connection.STAR).heatAndLosses();
        assertEquals(36, h.cogging().cyclesPerRevolution(), "LCM(36, 12)");
        assertTrue(h.cogging().peakNm() > 0);
        assertEquals(h.cogging().peakNm() + h.friction().breakawayTorqueNm(), h.startingTorqueNm(), 1e-12);
    }

    @Test
    void only_delta_carries_circulating_current_loss() {
        assertEquals(0, radial(Connection.STAR).heatAndLosses().rated().deltaCirculationLossW());
        assertTrue(radial(Connection.DELTA).heatAndLosses().rated().deltaCirculationLossW() > 0);
    }

    @Test
    void the_table_spans_the_range_with_its_top_and_at_most_the_stated_number_of_points() {
        HeatAndLosses h = axial().heatAndLosses();
        assertTrue(h.points().size() <= HeatAssessment.MAX_POINTS + 1);
        assertEquals(0, h.points().get(0).speedRpm());
        assertEquals(500, h.points().get(h.points().size() - 1).speedRpm(), 1e-9);
        assertEquals(350, h.rated().speedRpm(), 1e-12);
    }

    @Test
    void where_the_hot_spot_reaches_the_insulation_limit_it_is_at_the_limit() {
        HeatAndLosses h = radial(Connection.DELTA).heatAndLosses();
        if (h.insulationLimitReached()) {
            MachineLosses m = new MachineLosses(AlternatorEvaluator.evaluate(new EvaluationRequest(
                    SampleDesigns.radial12V().withConnection(Connection.DELTA), battery12(), new SpeedRange(0, 400, 41),
                    250, 500)).alternator(), battery12(), h.ambientC());
            assertEquals(h.insulationLimitC(), m.steadyAt(h.insulationLimitSpeedRpm()).windingHotSpotC(), 1.0);
        } else {
            assertEquals(0, h.insulationLimitSpeedRpm());
            h.points().forEach(p -> assertTrue(p.windingHotSpotC() < h.insulationLimitC()));
        }
    }

    @Test
    void a_demagnetising_fault_or_a_hot_winding_at_rated_speed_is_among_the_cautions() {
        AlternatorEvaluation e = radial(Connection.DELTA);
        HeatAndLosses h = e.heatAndLosses();
        boolean demag = e.cautions().stream().anyMatch(c -> c.code().equals("MAGNET_DEMAGNETISATION"));
        assertEquals(h.demagnetisation().verdict() != coilwright.demag.Verdict.OK, demag);
        boolean hot = e.cautions().stream().anyMatch(c -> c.code().equals("WINDING_OVER_TEMPERATURE"));
        assertEquals(h.rated().windingHotSpotC() > h.insulationLimitC(), hot);
        for (int i = 1; i < e.cautions().size(); i++) {
            Caution.Severity before = e.cautions().get(i - 1).severity();
            assertTrue(before.compareTo(e.cautions().get(i).severity()) <= 0, "most serious first");
        }
    }

    @Test
    void the_demagnetisation_check_uses_the_hotter_magnet_temperature() {
        HeatAndLosses h = radial(Connection.STAR).heatAndLosses();
        double entered = SampleDesigns.radial12V().magnetTempC();
        assertTrue(h.demagnetisation().magnetTempC() == entered
                || h.demagnetisation().magnetTempC() == Math.max(entered, h.rated().magnetC()));
        assertFalse(h.assumptions().isEmpty());
    }

    @Test
    void speeds_beyond_the_thermal_models_are_left_out_of_the_table_and_said_so() {
        EvaluationRequest r = new EvaluationRequest(SampleDesigns.axial24V(),
                new coilwright.load.ResistiveLoad(50, Cable.NONE), new SpeedRange(0, 30_000, 7), 25_000, 30_000);
        HeatAndLosses h = AlternatorEvaluator.evaluate(r).heatAndLosses();
        double top = MachineLosses.maxSpeedRpm(AlternatorEvaluator.evaluate(r).alternator());
        assertEquals(20_000, top, "16 poles: the thermal networks' limit comes first");
        assertTrue(h.points().stream().allMatch(p -> p.speedRpm() <= top));
        assertEquals(top, h.rated().speedRpm());
        assertTrue(h.temperatureBasis().contains("beyond the thermal and iron-loss models"), h.temperatureBasis());
    }
}
