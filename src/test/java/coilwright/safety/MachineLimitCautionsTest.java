package coilwright.safety;

import coilwright.conductor.ThermalClass;
import coilwright.demag.DemagnetisationCheck;
import coilwright.demag.MagnetCircuit;
import coilwright.demag.ShortCircuitCurrent;
import coilwright.demag.Verdict;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.junit.jupiter.api.Assertions.*;

class MachineLimitCautionsTest {
    private static DemagnetisationCheck check(String grade, double tempC) {
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.INNER, grade, 0.14, 0.08, 0.001, 0.004, 0.8, 0.0025);
        return DemagnetisationCheck.of(MagnetCircuit.radial(r, 24, 20), tempC, 3, 20, 80, 0.866,
                ShortCircuitCurrent.of(40, 0.15, 1.26));
    }

    @Test
    void demagnetisation_gives_danger_warning_or_nothing() {
        DemagnetisationCheck danger = check("N42", 120);
        assertEquals(Verdict.DANGER, danger.verdict());
        Caution c = MachineLimitCautions.demagnetisation(danger).orElseThrow();
        assertEquals(Caution.Severity.DANGER, c.severity());
        assertTrue(c.message().contains("kA/m"));
        assertEquals(Optional.empty(), MachineLimitCautions.demagnetisation(check("N42SH", 20)));
        DemagnetisationCheck warn = check("Ferrite Y30", 80);
        assertEquals(Verdict.WARNING, warn.verdict());
        assertEquals(Caution.Severity.WARNING, MachineLimitCautions.demagnetisation(warn).orElseThrow().severity());
    }

    @Test
    void winding_temperature_warns_above_the_class_and_notices_near_it() {
        assertEquals(Caution.Severity.WARNING,
                MachineLimitCautions.windingTemperature(160, ThermalClass.F, "at 12 m/s", false).orElseThrow().severity());
        Caution near = MachineLimitCautions.windingTemperature(150, ThermalClass.F, "at 12 m/s", true).orElseThrow();
        assertEquals(Caution.Severity.NOTICE, near.severity());
        assertTrue(near.message().contains("you entered"));
        assertTrue(MachineLimitCautions.windingTemperature(120, ThermalClass.F, "at 12 m/s", false).isEmpty());
    }

    @Test
    void starting_cautions() {
        assertEquals(Caution.Severity.WARNING, MachineLimitCautions.starting(7, 3, 6).orElseThrow().severity());
        assertEquals(Caution.Severity.NOTICE, MachineLimitCautions.starting(4, 3, 6).orElseThrow().severity());
        assertTrue(MachineLimitCautions.starting(2.5, 3, 6).isEmpty());
    }
}
