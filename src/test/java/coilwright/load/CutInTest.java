package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CutInTest {
    @Test
    void cut_in_is_where_peak_line_emf_equals_battery_plus_two_drops() {
        double n = CutIn.speedRpm(0.1, 24, 0.8, BridgeType.THREE_PHASE_BRIDGE);
        assertEquals(25.6, Math.sqrt(2) * 0.1 * n, 1e-12);
    }

    @Test
    void solved_current_is_zero_just_below_cut_in_and_positive_just_above() {
        double pole = 6;
        double keLine = 0.12;
        for (BridgeType type : BridgeType.values()) {
            boolean three = type == BridgeType.THREE_PHASE_BRIDGE;
            double n = CutIn.speedRpm(keLine, 24, 0.8, type);
            BatteryLoad load = new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                    new Rectifier(type, DiodeType.SILICON), Cable.NONE, Cable.NONE);
            double kePhase = three ? keLine / Math.sqrt(3) : keLine;
            for (double ratio : new double[] {0.999, 1.001}) {
                double rpm = ratio * n;
                AcSource src = new AcSource(three ? 3 : 1, Connection.STAR, kePhase * rpm, pole * rpm / 60, 0.3, 0.002);
                OperatingPoint p = LoadSolver.solve(src, load);
                if (ratio < 1) {
                    assertEquals(0, p.dcCurrentA(), 0.0, type + " below cut-in");
                } else {
                    assertTrue(p.dcCurrentA() > 0, type + " above cut-in");
                }
            }
        }
    }

    @Test
    void rejects_bad_inputs() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CutIn.speedRpm(0, -1, 6, null));
        assertEquals(4, e.errors().size());
    }
}
