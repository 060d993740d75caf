package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

class PowerFlowTest {
    /** The rectifier solver's balance (about 1e-9 of the power) with room for rounding. */
    private static final double BALANCE = 1e-6;

    @Test
    void every_kind_of_operating_point_gives_a_balanced_breakdown() {
        AlternatorEvaluation e = HeatAssessmentTest.axial();
        for (SpeedPoint p : e.points()) {
            PowerFlow f = p.powerFlow();
            assertEquals(f.powerFromEmfW(), f.powerToLoadW() + f.lossW(), BALANCE * Math.max(1e-9, f.powerFromEmfW()));
            assertEquals(p.totalLossW(), f.lossW(), 1e-12 * Math.max(1, p.totalLossW()));
        }
        for (LossPoint p : e.heatAndLosses().points()) {
            PowerFlow f = p.powerFlow();
            // the losses ahead of the EMF close the balance to the shaft
            assertEquals(p.shaftPowerW(), f.powerFromEmfW() + p.conductorEddyLossW() + p.deltaCirculationLossW()
                    + p.statorIronLossW() + p.bearingFrictionLossW() + p.windageLossW(),
                    BALANCE * Math.max(1e-9, p.shaftPowerW()));
        }
    }

    @Test
    void nothing_flows_at_standstill_and_a_negative_share_is_refused() {
        assertEquals(PowerFlow.NONE, SpeedPoint.standstill().powerFlow());
        assertEquals(PowerFlow.NONE, WindMatchPoint.calm().powerFlow());
        assertEquals(PowerFlow.NONE, LossPoint.standstill(25).powerFlow());
        assertEquals(25, LossPoint.standstill(25).windingHotSpotC());
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new PowerFlow(1, 1, -1e-3, 0, 0, 0));
        assertEquals("windingCopperLossW", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> new PowerFlow(Double.NaN, 0, 0, 0, 0, 0));
    }
}
