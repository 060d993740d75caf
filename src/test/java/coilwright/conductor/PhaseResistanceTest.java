package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class PhaseResistanceTest {
    private static final double REL = 1e-12;

    @Test
    void resistance_is_rho_times_length_over_strand_area_over_paths_squared() {
        WireSpec wire = WireSpec.metric(1.0e-3, 2).withStrands(2);
        PhaseResistance r = PhaseResistance.of(new PhaseWinding(50, 4, 2, 0.3, wire), 75.0);
        double length = 50 * 4 * 0.3;
        double r20 = Copper.RESISTIVITY_20C_OHM_M * length / (2 * Math.PI / 4 * 1e-6) / 4;
        assertEquals(r20, r.resistance20COhm(), r20 * REL);
        assertEquals(r20 * 1.21615, r.resistanceHotOhm(), r20 * 1e-9);
        assertEquals(length, r.conductorLengthM(), 1e-12);
        assertEquals(8890 * length * 2 * Math.PI / 4 * 1e-6, r.copperMassPerPhaseKg(), 1e-12);
        assertEquals(3 * r.copperMassPerPhaseKg(), r.copperMassTotalKg(3), 1e-12);
        assertEquals(r.resistanceHotOhm(), r.resistanceOhmAt(75.0), 1e-15);
    }

    @Property
    void resistance_scales_with_turns_and_mean_turn_and_inversely_with_strands_and_paths_squared(
            @ForAll @IntRange(min = 1, max = 200) int turns,
            @ForAll @IntRange(min = 1, max = 4) int paths,
            @ForAll @IntRange(min = 1, max = 10) int strands,
            @ForAll @DoubleRange(min = 0.05, max = 2.0) double mlt,
            @ForAll @DoubleRange(min = -50, max = 250) double tempC) {
        WireSpec wire = WireSpec.awg(18, 1).withStrands(strands);
        int coils = 4 * paths;
        PhaseResistance base = PhaseResistance.of(new PhaseWinding(turns, coils, paths, mlt, wire), tempC);
        PhaseResistance doubleTurns = PhaseResistance.of(new PhaseWinding(2 * turns, coils, paths, mlt, wire), tempC);
        PhaseResistance doubleMlt = PhaseResistance.of(new PhaseWinding(turns, coils, paths, 2 * mlt, wire), tempC);
        PhaseResistance oneStrand = PhaseResistance.of(
                new PhaseWinding(turns, coils, paths, mlt, wire.withStrands(1)), tempC);
        PhaseResistance onePath = PhaseResistance.of(new PhaseWinding(turns, coils, 1, mlt, wire), tempC);
        assertTrue(base.resistanceHotOhm() > 0 && !Double.isNaN(base.resistanceHotOhm()));
        assertEquals(2 * base.resistanceHotOhm(), doubleTurns.resistanceHotOhm(), base.resistanceHotOhm() * 1e-9);
        assertEquals(2 * base.resistanceHotOhm(), doubleMlt.resistanceHotOhm(), base.resistanceHotOhm() * 1e-9);
        assertEquals(strands * base.resistanceHotOhm(), oneStrand.resistanceHotOhm(), oneStrand.resistanceHotOhm() * 1e-9);
        assertEquals(paths * paths * base.resistanceHotOhm(), onePath.resistanceHotOhm(), onePath.resistanceHotOhm() * 1e-9);
        assertTrue(base.copperMassPerPhaseKg() > 0);
    }

    @Property
    void hot_resistance_exceeds_cold_above_20c(@ForAll @DoubleRange(min = 20.5, max = 250) double tempC) {
        PhaseResistance r = PhaseResistance.of(new PhaseWinding(30, 3, 1, 0.2, WireSpec.awg(16, 2)), tempC);
        assertTrue(r.resistanceHotOhm() > r.resistance20COhm());
    }

    @Test
    void rejects_nan_working_temperature_and_missing_winding() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> PhaseResistance.of(null, Double.NaN));
        assertEquals(2, e.errors().size());
        assertEquals("workingTemperatureC", e.errors().get(1).field());
    }

    @Test
    void rejects_a_phase_count_out_of_range() {
        PhaseResistance r = PhaseResistance.of(new PhaseWinding(30, 3, 1, 0.2, WireSpec.awg(16, 2)), 60);
        assertThrows(InvalidInputException.class, () -> r.copperMassTotalKg(0));
    }
}
