package coilwright.turbine;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class PenstockTest {
    private final Penstock pvc = new Penstock(PenstockSpec.of(200, 0.1, PipeMaterial.PVC, 2.5));

    @Test
    void head_loss_is_friction_plus_fittings() {
        double q = 0.012;
        double v = q / (Math.PI / 4 * 0.01);
        assertEquals(2.5 * v * v / (2 * 9.80665), pvc.minorLossM(q), 1e-12);
        assertEquals(pvc.frictionLossM(q, 10) + pvc.minorLossM(q), pvc.headLossM(q, 10), 1e-12);
    }

    @Test
    void darcy_weisbach_loss_uses_the_colebrook_factor() {
        double q = 0.012;
        double v = pvc.velocityMs(q);
        double f = PipeFriction.colebrook(pvc.reynoldsNumber(q, 10), pvc.spec().relativeRoughness());
        assertEquals(f * 200 / 0.1 * v * v / (2 * 9.80665), pvc.frictionLossM(q, 10), 1e-12);
    }

    @Test
    void zero_flow_loses_nothing() {
        assertEquals(0.0, pvc.headLossM(0, 10));
    }

    @Test
    void net_head_and_efficiency_follow_from_the_loss() {
        PenstockResult r = pvc.analyse(new HydroSite(40, 0.012));
        assertEquals(40 - r.headLossM(), r.netHeadM(), 1e-12);
        assertEquals(r.netHeadM() / 40, r.penstockEfficiency(), 1e-12);
        assertFalse(r.laminar());
        assertEquals(10.0, r.waterTempC());
    }

    @Test
    void warns_when_the_loss_exceeds_the_chosen_share() {
        PenstockResult r = pvc.analyse(20, 0.02, 10, 0.10);
        assertTrue(r.lossShare() > 0.10, "share " + r.lossShare());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("exceeds 10 %")), r.warnings().toString());
        assertEquals(List.of(), new Penstock(PenstockSpec.of(200, 0.2, PipeMaterial.PVC, 2.5))
                .analyse(20, 0.02, 10, 0.10).warnings());
    }

    @Test
    void refuses_a_pipe_that_eats_the_whole_head() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> new Penstock(PenstockSpec.of(500, 0.05, PipeMaterial.COMMERCIAL_STEEL, 0)).analyse(10, 0.02, 10, 0.1));
        assertEquals("penstock.innerDiameterM", e.field());
    }

    @Test
    void rejects_negative_head_and_flow() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> pvc.analyse(-5, -1, 10, 0.1));
        assertEquals("grossHeadM", e.errors().get(0).field());
        assertEquals("flowM3s", e.errors().get(1).field());
    }
}
