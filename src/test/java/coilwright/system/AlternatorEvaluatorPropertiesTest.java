package coilwright.system;

import coilwright.conductor.WireGauge;
import coilwright.conductor.WireSpec;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Load;
import coilwright.load.Rectifier;
import coilwright.load.ResistiveLoad;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.machine.SampleDesigns;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

import static org.junit.jupiter.api.Assertions.*;

/** Properties of the operating curve over random valid designs (DESIGN.md section 5). */
class AlternatorEvaluatorPropertiesTest {

    record Case(AlternatorSpec spec, Load load) {
    }

    @Provide
    Arbitrary<Case> cases() {
        Arbitrary<AlternatorSpec> base = Arbitraries.of(SampleDesigns.axial24V(), SampleDesigns.radial12V());
        Arbitrary<Integer> turnsDelta = Arbitraries.integers().between(-4, 4);
        Arbitrary<Integer> awg = Arbitraries.integers().between(15, 22);
        Arbitrary<Connection> conn = Arbitraries.of(Connection.values());
        Arbitrary<Load> load = Arbitraries.oneOf(
                Combinators.combine(Arbitraries.of(Chemistry.LEAD_ACID, Chemistry.LIFEPO4), Arbitraries.integers().between(4, 16),
                                Arbitraries.of(DiodeType.values()), Arbitraries.doubles().between(0, 60))
                        .as((chem, cells, diode, cableM) -> new BatteryLoad(Battery.of(chem, cells, ChargeStage.NOMINAL),
                                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, diode), new Cable(cableM, 6e-6, 30), new Cable(2, 16e-6, 25))),
                Arbitraries.doubles().between(0.2, 20).map(r -> new ResistiveLoad(r, new Cable(10, 4e-6, 25))));
        return Combinators.combine(base, turnsDelta, awg, conn, load).as((s, dt, g, c, l) -> new Case(
                s.withTurnsPerCoil(Math.max(4, s.turnsPerCoil() + dt)).withWire(new WireSpec(WireGauge.AWG, g, 0, 2, 1)).withConnection(c), l));
    }

    @Property(tries = 60)
    void no_nan_no_negative_loss_and_energy_is_conserved(@ForAll("cases") Case c, @ForAll @DoubleRange(min = 0, max = 900) double speedRpm) {
        Alternator alt = AlternatorModel.build(c.spec());
        SpeedPoint p = AlternatorEvaluator.point(alt, c.load(), speedRpm);
        double[] all = {p.emfLineRmsV(), p.terminalLineRmsV(), p.dcCurrentA(), p.phaseCurrentRmsA(), p.powerToLoadW(),
                p.windingCopperLossW(), p.cableLossW(), p.diodeLossW(), p.batteryInternalLossW(), p.shaftPowerW(), p.shaftTorqueNm(), p.efficiency()};
        for (double v : all) {
            assertTrue(Double.isFinite(v) && v >= 0, "finite and non-negative: " + p);
        }
        double balance = p.powerToLoadW() + p.totalLossW();
        assertEquals(p.shaftPowerW(), balance, 1e-9 * Math.max(1, p.shaftPowerW()), "shaft power = load + losses");
        assertTrue(p.efficiency() <= 1 + 1e-12);
    }

    @Property(tries = 40)
    void emf_is_proportional_to_speed(@ForAll("cases") Case c, @ForAll @DoubleRange(min = 1, max = 900) double speedRpm) {
        Alternator alt = AlternatorModel.build(c.spec());
        SpeedPoint p1 = AlternatorEvaluator.point(alt, c.load(), speedRpm);
        SpeedPoint p2 = AlternatorEvaluator.point(alt, c.load(), 2 * speedRpm);
        assertEquals(2 * p1.emfLineRmsV(), p2.emfLineRmsV(), 1e-9 * p2.emfLineRmsV());
        assertEquals(2 * p1.frequencyHz(), p2.frequencyHz(), 1e-9 * p2.frequencyHz());
    }

    @Property(tries = 40)
    void no_current_below_cut_in_and_rising_above(@ForAll("cases") Case c, @ForAll @DoubleRange(min = 0.05, max = 0.98) double below,
                                                  @ForAll @DoubleRange(min = 1.02, max = 3) double above) {
        if (!(c.load() instanceof BatteryLoad)) {
            return;
        }
        Alternator alt = AlternatorModel.build(c.spec());
        double cutIn = AlternatorEvaluator.closedFormCutInRpm(alt, c.load());
        assertEquals(0.0, AlternatorEvaluator.point(alt, c.load(), below * cutIn).dcCurrentA());
        double i1 = AlternatorEvaluator.point(alt, c.load(), above * cutIn).dcCurrentA();
        double i2 = AlternatorEvaluator.point(alt, c.load(), (above + 0.1) * cutIn).dcCurrentA();
        assertTrue(i1 > 0, "current above cut-in");
        assertTrue(i2 > i1, "current rises with speed: " + i1 + " -> " + i2);
    }

    @Property(tries = 25)
    void the_warm_started_sweep_agrees_with_cold_single_point_solves(@ForAll("cases") Case c,
                                                                     @ForAll @DoubleRange(min = 100, max = 900) double maxRpm) {
        Alternator alt = AlternatorModel.build(c.spec());
        EvaluationRequest req = new EvaluationRequest(c.spec(), c.load(), new SpeedRange(0, maxRpm, 61), 0.55 * maxRpm, 0);
        AlternatorEvaluation fast = AlternatorEvaluator.evaluate(alt, req);
        for (int i = 0; i < req.speedRange().points(); i++) {
            assertSamePoint(AlternatorEvaluator.point(alt, c.load(), req.speedRange().speedRpm(i)), fast.points().get(i));
        }
        assertSamePoint(AlternatorEvaluator.point(alt, c.load(), req.effectiveRatedSpeedRpm()), fast.rated());
        if (c.load() instanceof BatteryLoad) {
            double reference = AlternatorEvaluator.solvedCutInRpm(alt, c.load(), fast.cutInSpeedRpm());
            assertEquals(reference, fast.cutInSpeedSolvedRpm(), 1e-12 * reference, "solved cut-in");
            assertTrue(AlternatorEvaluator.point(alt, c.load(), fast.cutInSpeedSolvedRpm()).dcCurrentA() > 0,
                    "the solver itself carries current at the solved cut-in");
        }
    }

    /** Every component equal to 1e-9 of the point's own scale (its largest power, current or voltage). */
    private static void assertSamePoint(SpeedPoint expected, SpeedPoint actual) {
        assertEquals(expected.mode(), actual.mode(), "conduction mode at " + expected.speedRpm() + " rpm");
        for (java.lang.reflect.RecordComponent rc : SpeedPoint.class.getRecordComponents()) {
            if (rc.getType() != double.class) {
                continue;
            }
            double e = component(rc, expected);
            double a = component(rc, actual);
            double tol = 1e-9 * Math.max(Math.abs(e), 1e-9 * scale(expected)) + 1e-300;
            assertEquals(e, a, tol, rc.getName() + " at " + expected.speedRpm() + " rpm");
        }
    }

    private static double scale(SpeedPoint p) {
        return Math.max(Math.max(p.shaftPowerW(), p.emfLineRmsV()), Math.max(p.phaseCurrentRmsA(), 1));
    }

    private static double component(java.lang.reflect.RecordComponent rc, SpeedPoint p) {
        try {
            return (double) rc.getAccessor().invoke(p);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(e);
        }
    }
}
