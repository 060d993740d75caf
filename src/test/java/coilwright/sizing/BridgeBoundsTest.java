package coilwright.sizing;

import coilwright.load.AcSource;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.DiodeType;
import coilwright.load.LoadSolver;
import coilwright.load.OperatingPoint;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The closed-form bounds hold for every operating point the full bridge model solves, whatever the inductance. */
class BridgeBoundsTest {
    /** The solver's periodic steady state is good to about 1e-12 relative; the comparison allows 1e-9. */
    private static final double SOLVER_TOLERANCE = 1e-9;

    @Property(tries = 400)
    void no_solved_operating_point_exceeds_the_bounds(
            @ForAll boolean delta,
            @ForAll @DoubleRange(min = 1, max = 200) @Scale(6) double emfPhaseV,
            @ForAll @DoubleRange(min = 5, max = 300) @Scale(6) double frequencyHz,
            @ForAll @DoubleRange(min = 0.01, max = 10) @Scale(6) double phaseOhm,
            @ForAll @DoubleRange(min = 1e-5, max = 0.1) @Scale(6) double phaseH,
            @ForAll @DoubleRange(min = 6, max = 60) @Scale(6) double batteryV,
            @ForAll @DoubleRange(min = 0, max = 1) @Scale(6) double diodeV,
            @ForAll @DoubleRange(min = 0, max = 100) @Scale(3) double acCableM,
            @ForAll @DoubleRange(min = 0, max = 20) @Scale(3) double dcCableM,
            @ForAll @DoubleRange(min = 0, max = 0.2) @Scale(6) double internalOhm) {
        Connection c = delta ? Connection.DELTA : Connection.STAR;
        BatteryLoad load = new BatteryLoad(Battery.custom(batteryV).withInternalResistanceOhm(internalOhm),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, diodeV), new Cable(acCableM, 4e-6, 40),
                new Cable(dcCableM, 10e-6, 30));
        AcSource source = new AcSource(3, c, emfPhaseV, frequencyHz, phaseOhm, phaseH);
        OperatingPoint p = LoadSolver.solve(source, load);

        double a = batteryV + 2 * diodeV;
        double lineOhm = source.starResistanceOhm() + load.acCable().lineResistanceOhm();
        double dcOhm = load.dcCable().pairResistanceOhm() + internalOhm;
        double d = p.dcCurrentA();
        double cap = BridgeBounds.maxDcCurrentA(source.starEmfRmsV(), source.lineEmfRmsV(), a, lineOhm, dcOhm);
        assertTrue(d <= cap * (1 + SOLVER_TOLERANCE) + 1e-12, () -> "DC current " + d + " above its bound " + cap);
        assertTrue(p.powerFromEmfW() + 1e-9 >= a * d + (1.5 * lineOhm + dcOhm) * d * d * (1 - SOLVER_TOLERANCE),
                () -> "shaft power " + p.powerFromEmfW() + " below the least losses at " + d + " A");
        double shaft = p.powerFromEmfW();
        assertTrue(d <= BridgeBounds.dcCurrentFromShaftPowerA(shaft, a, lineOhm, dcOhm) * (1 + SOLVER_TOLERANCE) + 1e-12);
        double reactanceOhm = source.angularFrequencyRadPerS() * source.starInductanceH();
        double minLine = BridgeBounds.minLineCurrentRmsA(source.lineEmfRmsV(), a, lineOhm, reactanceOhm, dcOhm);
        assertTrue(p.lineCurrentRmsA() >= minLine * (1 - SOLVER_TOLERANCE) - 1e-12,
                () -> "line current " + p.lineCurrentRmsA() + " below its bound " + minLine);
        assertTrue(p.lineCurrentRmsA() >= BridgeBounds.lineCurrentFromDcA(d) * (1 - SOLVER_TOLERANCE),
                () -> "line current " + p.lineCurrentRmsA() + " below d / sqrt(2) at d = " + d);
        if (d > 0) {
            double bound = BridgeBounds.maxEfficiency(batteryV, a, lineOhm, dcOhm, 0.5 * d, cap, minLine);
            assertTrue(p.efficiencyFromEmf() <= bound * (1 + SOLVER_TOLERANCE),
                    () -> "efficiency " + p.efficiencyFromEmf() + " above its bound " + bound);
        }
    }

    @Test
    void the_peak_bound_is_zero_exactly_at_the_cut_in_threshold() {
        double a = 25.6;
        double lineAtThreshold = a / Math.sqrt(2);
        assertEquals(0, BridgeBounds.maxDcCurrentA(lineAtThreshold / Math.sqrt(3), lineAtThreshold, a, 0.3, 0.01));
        assertTrue(BridgeBounds.maxDcCurrentA(1.01 * lineAtThreshold / Math.sqrt(3), 1.01 * lineAtThreshold, a, 0.3,
                0.01) > 0);
    }

    @Test
    void a_resistive_source_far_above_cut_in_is_bounded_by_the_rms_bound_near_its_short_circuit_current() {
        // E = 100 V per phase, R = 1 Ohm, a = 10 V: the RMS bound (sqrt(4.5) E - a) / 1.5 R = 134.7 A is tighter
        // than the peak bound (sqrt(6) E - a) / 1.5 R = 156.6 A
        double e = 100;
        double cap = BridgeBounds.maxDcCurrentA(e, Math.sqrt(3) * e, 10, 1, 0);
        assertEquals((Math.sqrt(4.5) * e - 10) / 1.5, cap, 1e-9);
    }

    @Test
    void the_line_current_bound_is_zero_until_the_emf_clears_the_square_wave_of_the_bridge() {
        // 4/pi x 25.6 V = 32.6 V: a line EMF of 23 V rms (32.5 V peak) proves nothing yet, 30 V rms does
        assertEquals(0, BridgeBounds.minLineCurrentRmsA(23, 25.6, 0.1, 0.05, 0));
        double i = BridgeBounds.minLineCurrentRmsA(30, 25.6, 0.1, 0.05, 0);
        assertEquals((Math.sqrt(2) * 30 - 4 / Math.PI * 25.6) / (Math.sqrt(6) * Math.hypot(0.1, 0.05)), i, 1e-12);
    }

    @Test
    void the_positive_root_solves_the_quadratic() {
        double x = BridgeBounds.positiveRoot(0.3, 26, 500);
        assertEquals(500, 0.3 * x * x + 26 * x, 1e-9);
        assertEquals(500.0 / 26, BridgeBounds.positiveRoot(0, 26, 500), 1e-12);
    }
}
