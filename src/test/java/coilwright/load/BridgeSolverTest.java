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
}
