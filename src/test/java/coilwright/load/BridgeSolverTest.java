package coilwright.load;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class BridgeSolverTest {

    private static BridgeCircuit circuit(boolean three, double e, double f, double r, double l, double vb, double vd,
                                         double rdc, double rcab, double rint) {
        return new BridgeCircuit(three ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE,
                e, f, r, rcab, l, vb, vd, rdc, rint);
    }

    @Property(tries = 300)
    void energy_is_conserved_and_nothing_is_nan_or_negative(
            @ForAll boolean three,
            @ForAll @DoubleRange(min = 0.5, max = 400) @Scale(6) double emf,
            @ForAll @DoubleRange(min = 5, max = 400) @Scale(6) double f,
            @ForAll @DoubleRange(min = 0.005, max = 20) @Scale(6) double r,
            @ForAll @DoubleRange(min = 1e-5, max = 0.2) @Scale(6) double l,
            @ForAll @DoubleRange(min = 1, max = 400) @Scale(6) double vb,
            @ForAll @DoubleRange(min = 0, max = 1.5) @Scale(6) double vd,
            @ForAll @DoubleRange(min = 0, max = 2) @Scale(6) double rdc,
            @ForAll @DoubleRange(min = 0, max = 1) @Scale(6) double rcab,
            @ForAll @DoubleRange(min = 0, max = 0.5) @Scale(6) double rint) {
        BridgeOperatingPoint p = BridgeSolver.solve(circuit(three, emf, f, r, l, vb, vd, rdc, rcab, rint));
        double[] values = {p.dcCurrentA(), p.dcCurrentRmsA(), p.lineCurrentRmsA(), p.lineCurrentPeakA(),
                p.deltaPhaseCurrentPeakA(), p.lineToLineTerminalVoltageRmsV(), p.powerFromEmfW(),
                p.powerToBatteryW(), p.windingCopperLossW(), p.acCableLossW(), p.dcCableLossW(),
                p.batteryInternalLossW(), p.diodeLossW(), p.conductionAngleDeg(), p.commutationOverlapDeg()};
        for (double v : values) {
            assertTrue(Double.isFinite(v) && v >= 0, () -> "non-finite or negative value in " + p);
        }
        assertEquals(0, p.energyBalanceResidualW(), 1e-9 * Math.max(p.powerFromEmfW(), 1e-12), () -> p.toString());
        assertTrue(p.lineCurrentPeakA() + 1e-12 >= p.lineCurrentRmsA(), "peak >= rms");
        assertTrue(p.dcCurrentRmsA() + 1e-12 >= p.dcCurrentA(), "rms >= average");
        assertTrue(p.efficiencyFromEmf() <= 1 + 1e-12);
    }

    @Property(tries = 60)
    void dc_current_rises_with_speed_above_cut_in_and_is_zero_below(
            @ForAll boolean three,
            @ForAll @DoubleRange(min = 0.05, max = 2) @Scale(6) double kePhaseVPerHz,
            @ForAll @DoubleRange(min = 0.05, max = 5) @Scale(6) double r,
            @ForAll @DoubleRange(min = 1e-4, max = 0.05) @Scale(6) double l,
            @ForAll @IntRange(min = 1, max = 4) int bank) {
        double vb = 12.0 * bank;
        double vd = 0.8;
        double lineFactor = three ? Math.sqrt(3) : 1;
        double cutInHz = (vb + 2 * vd) / (Math.sqrt(2) * lineFactor * kePhaseVPerHz);
        double previous = -1;
        for (double ratio : new double[] {0.5, 0.99, 1.01, 1.1, 1.3, 1.7, 2.5, 4}) {
            double f = ratio * cutInHz;
            BridgeOperatingPoint p = BridgeSolver.solve(circuit(three, kePhaseVPerHz * f, f, r, l, vb, vd, 0.01, 0, 0));
            if (ratio < 1) {
                assertEquals(0, p.dcCurrentA(), 0.0, "zero below cut-in");
                assertEquals(ConductionMode.ZERO_BELOW_CUT_IN, p.mode());
            } else {
                assertTrue(p.dcCurrentA() > previous, "current rises with speed: " + p.dcCurrentA() + " after " + previous);
            }
            previous = p.dcCurrentA();
        }
    }

    @Test
    void just_above_cut_in_the_line_current_is_discontinuous() {
        BridgeOperatingPoint p = BridgeSolver.solve(circuit(false, 19, 50, 0.3, 0.002, 24, 0.8, 0, 0, 0));
        assertEquals(ConductionMode.DISCONTINUOUS, p.mode());
        assertTrue(p.conductionAngleDeg() > 0 && p.conductionAngleDeg() < 180, "conduction angle " + p.conductionAngleDeg());
    }

    @Test
    void high_current_three_phase_bridge_commutates_with_overlap() {
        BridgeOperatingPoint p = BridgeSolver.solve(circuit(true, 100, 50, 0.2, 0.002, 24, 0.8, 0.05, 0, 0));
        assertEquals(ConductionMode.CONTINUOUS_WITH_OVERLAP, p.mode());
        assertTrue(p.commutationOverlapDeg() > 0);
        assertEquals(p.dcVoltageAtRectifierV(), 24 + 0.05 * p.dcCurrentA(), 1e-9);
    }

    @Test
    void below_cut_in_only_the_open_circuit_voltage_remains() {
        BridgeOperatingPoint p = BridgeSolver.solve(circuit(true, 5, 50, 0.2, 0.002, 24, 0.8, 0, 0, 0));
        assertEquals(0, p.powerFromEmfW(), 0.0);
        assertEquals(5 * Math.sqrt(3), p.lineToLineTerminalVoltageRmsV(), 1e-12);
    }

    /**
     * Regression: an axial 24 V design's cut-in bisection probed speeds where sqrt(2) E_LL exceeded Vb + 2 Vd by
     * a few parts in 1e10; the pair's current, starting from a double root, ended on rounding noise and restarted
     * at the same instant until "more than 200 switching events in one interval (w = 89.91 rad/s, V0 = 25.6 V)".
     */
    @Test
    void more_than_200_switching_events_in_one_interval_no_longer_occurs_near_cut_in() {
        double f = 89.91231084986968 / (2 * Math.PI);
        double threshold = 24 + 2 * 0.8;
        for (boolean three : new boolean[] {true, false}) {
            double toPhase = Math.sqrt(2) * (three ? Math.sqrt(3) : 1);
            for (double margin = 1e-14; margin < 0.1; margin *= 3) {
                BridgeCircuit c = circuit(three, threshold * (1 + margin) / toPhase, f, 0.9, 0.004, 24, 0.8, 0.02, 0.05, 0.01);
                BridgeOperatingPoint p = BridgeSolver.solve(c);
                assertTrue(p.dcCurrentA() >= 0 && Double.isFinite(p.dcCurrentA()), () -> p.toString());
                assertEquals(0, p.energyBalanceResidualW(), 1e-9 * p.powerFromEmfW(), () -> p.toString());
            }
        }
    }

    @Property(tries = 400)
    void near_cut_in_the_solution_is_finite_conserves_energy_and_its_current_tends_to_zero(
            @ForAll boolean three,
            @ForAll boolean above,
            @ForAll @DoubleRange(min = -14, max = -2) @Scale(8) double log10Margin,
            @ForAll @DoubleRange(min = 5, max = 400) @Scale(8) double f,
            @ForAll @DoubleRange(min = 0.001, max = 20) @Scale(8) double r,
            @ForAll @DoubleRange(min = 1e-5, max = 0.2) @Scale(8) double l,
            @ForAll @DoubleRange(min = 1, max = 400) @Scale(8) double vb,
            @ForAll @DoubleRange(min = 0, max = 1.5) @Scale(8) double vd,
            @ForAll @DoubleRange(min = 0, max = 2) @Scale(8) double rdc,
            @ForAll @DoubleRange(min = 0, max = 1) @Scale(8) double rcab) {
        double margin = Math.pow(10, log10Margin) * (above ? 1 : -1);
        double threshold = vb + 2 * vd;
        double toPhase = Math.sqrt(2) * (three ? Math.sqrt(3) : 1);
        BridgeCircuit c = circuit(three, threshold * (1 + margin) / toPhase, f, r, l, vb, vd, rdc, rcab, 0);
        BridgeOperatingPoint p = BridgeSolver.solve(c);
        double[] values = {p.dcCurrentA(), p.dcCurrentRmsA(), p.lineCurrentRmsA(), p.lineCurrentPeakA(),
                p.deltaPhaseCurrentPeakA(), p.powerFromEmfW(), p.powerToBatteryW(), p.windingCopperLossW(),
                p.acCableLossW(), p.dcCableLossW(), p.diodeLossW(), p.conductionAngleDeg()};
        for (double v : values) {
            assertTrue(Double.isFinite(v) && v >= 0, () -> "non-finite or negative value in " + p);
        }
        assertEquals(0, p.energyBalanceResidualW(), 1e-9 * p.powerFromEmfW(), () -> p.toString());
        assertTrue(p.dcCurrentRmsA() >= p.dcCurrentA() * (1 - 1e-12), "rms >= average: " + p);
        assertTrue(p.lineCurrentPeakA() >= p.lineCurrentRmsA() * (1 - 1e-12), "peak >= rms: " + p);
        if (!above) {
            assertEquals(0, p.dcCurrentA(), 0.0, "no current below cut-in");
        }
        // the loop current never exceeds (peak EMF - V0) / loop resistance: it tends to zero with the margin
        double loopOhm = three ? 2 * (r + rcab) + rdc : r + 2 * rcab + rdc;
        double excessV = Math.max(c.peakDrivingEmfV() - threshold, 0);
        assertTrue(p.lineCurrentPeakA() <= excessV / loopOhm * (1 + 1e-9) + 1e-300, "bounded by the margin: " + p);
        // and it does not fall as the margin grows
        BridgeCircuit wider = circuit(three, threshold * (1 + 2 * Math.abs(margin)) / toPhase, f, r, l, vb, vd, rdc, rcab, 0);
        assertTrue(BridgeSolver.solve(wider).dcCurrentA() >= p.dcCurrentA(), "current rises with the margin");
    }

    @Property(tries = 40)
    void a_warm_started_sweep_gives_the_cold_answers_to_1e_9(
            @ForAll boolean three,
            @ForAll @DoubleRange(min = 0.05, max = 2) @Scale(6) double kePhaseVPerHz,
            @ForAll @DoubleRange(min = 0.02, max = 5) @Scale(6) double r,
            @ForAll @DoubleRange(min = 1e-4, max = 0.05) @Scale(6) double l,
            @ForAll @DoubleRange(min = 0, max = 1) @Scale(6) double rdc,
            @ForAll @DoubleRange(min = 1.5, max = 12) double topRatio) {
        double vb = 24;
        double vd = 0.8;
        double lineFactor = three ? Math.sqrt(3) : 1;
        double cutInHz = (vb + 2 * vd) / (Math.sqrt(2) * lineFactor * kePhaseVPerHz);
        BridgeWarmStart warm = new BridgeWarmStart();
        for (int i = 1; i <= 40; i++) {
            double f = cutInHz * topRatio * i / 40;
            BridgeCircuit c = circuit(three, kePhaseVPerHz * f, f, r, l, vb, vd, rdc, 0.05, 0.01);
            BridgeOperatingPoint cold = BridgeSolver.solve(c);
            BridgeOperatingPoint fast = BridgeSolver.solve(c, warm);
            assertEquals(cold.mode(), fast.mode(), "mode at " + f + " Hz");
            double[][] pairs = {
                    {cold.dcCurrentA(), fast.dcCurrentA()}, {cold.dcCurrentRmsA(), fast.dcCurrentRmsA()},
                    {cold.lineCurrentRmsA(), fast.lineCurrentRmsA()}, {cold.lineCurrentPeakA(), fast.lineCurrentPeakA()},
                    {cold.deltaPhaseCurrentPeakA(), fast.deltaPhaseCurrentPeakA()},
                    {cold.lineToLineTerminalVoltageRmsV(), fast.lineToLineTerminalVoltageRmsV()},
                    {cold.powerFromEmfW(), fast.powerFromEmfW()}, {cold.diodeLossW(), fast.diodeLossW()},
                    {cold.conductionAngleDeg(), fast.conductionAngleDeg()},
                    {cold.commutationOverlapDeg(), fast.commutationOverlapDeg()}};
            for (double[] p : pairs) {
                assertEquals(p[0], p[1], 1e-9 * Math.max(Math.abs(p[0]), 1e-6), () -> "at " + f + " Hz: " + cold + " vs " + fast);
            }
        }
    }

    @Test
    void the_zero_test_matches_the_solved_answer_on_both_sides_of_the_threshold() {
        double vb = 12;
        double vd = 0.7;
        double threshold = (vb + 2 * vd) / Math.cos(BridgeModel.MIN_WINDOW_RAD);
        double ePhaseAtThreshold = threshold / (Math.sqrt(2) * Math.sqrt(3));
        for (double ratio : new double[] {0.999, 1 - 1e-9, 1 + 1e-9, 1.001}) {
            BridgeCircuit c = circuit(true, ePhaseAtThreshold * ratio, 50, 0.3, 2e-3, vb, vd, 0.01, 0.02, 0.01);
            assertEquals(ratio > 1, BridgeSolver.conducts(c), "zero test at ratio " + ratio);
            assertEquals(ratio > 1, BridgeSolver.solve(c).dcCurrentA() > 0, "solved current at ratio " + ratio);
        }
    }

    @Test
    void a_circuit_beyond_the_resolvable_reactance_ratios_is_refused_with_a_typed_failure() {
        // wL/R = 2 pi 50 x 1 / 1e-5 = 3e7: a lossless winding; and wL/(R + Rdc) = 3e-9 / 1e3: a resistive one
        for (BridgeCircuit c : new BridgeCircuit[] {circuit(true, 100, 50, 1e-5, 1, 24, 0.8, 0, 0, 0),
                circuit(false, 100, 50, 1e3, 1e-8, 24, 0.8, 0, 0, 0)}) {
            coilwright.validation.SolverFailedException e = org.junit.jupiter.api.Assertions.assertThrows(
                    coilwright.validation.SolverFailedException.class, () -> BridgeSolver.solve(c));
            assertTrue(e.getMessage().contains("50.0000 Hz") && e.getMessage().contains("reactance"), e.getMessage());
            assertEquals("phaseInductanceH", e.field());
        }
    }
}
