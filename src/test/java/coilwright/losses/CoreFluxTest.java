package coilwright.losses;

import coilwright.machine.SlottedStator;
import coilwright.magnet.GapField;
import coilwright.magnet.GapFieldCalculator;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CoreFluxTest {
    static final RadialSurfaceRotor ROTOR = new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.14, 0.08, 0.001,
            0.004, 0.8, 0.0025);
    static final SlottedStator STATOR = new SlottedStator(0.024, 0.008, 0.0015, 0.0002, 0.006);
    static final StatorCore CORE = StatorCore.of("M400-50A", 0.012);
    static final GapField FIELD = GapFieldCalculator.solve(ROTOR, 20, 24, 60);

    @Test
    void tooth_and_yoke_flux_densities_follow_the_magnetic_circuit_by_hand() {
        CoreFlux f = CoreFlux.of(ROTOR, STATOR, CORE, 24, FIELD);
        double slotPitch = Math.PI * 0.14 / 24;
        double rMid = 0.07 + 0.0015 + 0.012;
        double wMean = 2 * Math.PI * rMid / 24 - 0.008;
        assertEquals(wMean, f.toothMeanWidthM(), 1e-12);
        assertEquals(FIELD.peakFluxDensity2dT() * slotPitch / (0.95 * wMean), f.toothMeanT(), 1e-12);
        assertEquals(FIELD.fluxPerPoleWb() / (2 * 0.95 * 0.012 * 0.08), f.yokeT(), 1e-12);
        assertTrue(f.toothMaxT() > f.toothMeanT(), "the tooth is narrowest next to the bore");
        double yokeRadius = 0.07 + 0.0015 + 0.024 + 0.006;
        assertEquals(2 * Math.PI * yokeRadius * 0.012 * 0.08 * 0.95 * 7700, f.yokeMassKg(), 1e-9);
    }

    @Test
    void a_thin_yoke_is_warned_about() {
        CoreFlux f = CoreFlux.of(ROTOR, STATOR, StatorCore.of("M400-50A", 0.004), 24, FIELD);
        assertTrue(f.yokeT() > CoreFlux.YOKE_SATURATION_T);
        assertTrue(f.warnings().stream().anyMatch(w -> w.contains("yoke")), f.warnings().toString());
    }

    @Test
    void slots_that_leave_no_tooth_are_infeasible() {
        SlottedStator wide = new SlottedStator(0.024, 0.02, 0.0015, 0.0002, 0.006);
        assertThrows(InfeasibleDesignException.class, () -> CoreFlux.of(ROTOR, wide, CORE, 24, FIELD));
    }

    @Test
    void core_inputs_are_validated_together() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new StatorCore("M1", -1, 0.5, 9));
        assertEquals(4, e.errors().size());
    }
}
