package coilwright.winding;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class WindingTest {
    static final double TOL = 1e-12;
    final Winding toothCoils = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE).withSkewSlotPitches(0.2));

    @Test
    void emf_harmonic_ratio_is_the_factor_ratio_times_the_flux_density_ratio() {
        HarmonicFactor h5 = toothCoils.harmonic(5);
        double expected = h5.windingFactor() * h5.skewFactor() * 0.1 / (toothCoils.fundamentalWindingFactor()
                * toothCoils.harmonic(1).skewFactor());
        assertEquals(expected, toothCoils.emfHarmonicRatio(5, 0.1), TOL);
        assertEquals(1.0, toothCoils.emfHarmonicRatio(1, 1.0), TOL);
        assertEquals(0.0, toothCoils.emfHarmonicRatio(3, 0.0), TOL);
    }

    @Test
    void emf_harmonic_ratio_refuses_even_orders_and_negative_ratios() {
        InvalidInputException order = assertThrows(InvalidInputException.class, () -> toothCoils.emfHarmonicRatio(2, 0.1));
        assertEquals("order", order.errors().get(0).field());
        InvalidInputException ratio = assertThrows(InvalidInputException.class,
                () -> toothCoils.emfHarmonicRatio(5, -0.1));
        assertEquals("fluxDensityHarmonicRatio", ratio.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> toothCoils.emfHarmonicRatio(5, Double.NaN));
    }

    @Test
    void total_fundamental_factor_includes_the_skew() {
        assertEquals(toothCoils.fundamentalWindingFactor() * toothCoils.harmonic(1).skewFactor(),
                toothCoils.fundamentalTotalFactor(), TOL);
        assertTrue(toothCoils.fundamentalTotalFactor() < toothCoils.fundamentalWindingFactor());
        assertEquals(3, toothCoils.thirdHarmonicFactor().order());
        assertEquals(Winding.HARMONIC_ORDERS, toothCoils.windingFactors().stream().map(HarmonicFactor::order).toList());
    }

    @Test
    void the_result_is_immutable() {
        assertThrows(UnsupportedOperationException.class, () -> toothCoils.coils().clear());
        assertThrows(UnsupportedOperationException.class, () -> toothCoils.phaseCoils().get(0).clear());
        assertThrows(UnsupportedOperationException.class, () -> toothCoils.parallelPathCoils().get(0).get(0).clear());
        List<Coil> mine = new ArrayList<>(toothCoils.coils());
        Winding copy = new Winding(toothCoils.spec(), toothCoils.q(), 1, 60, 2, 150, 1, mine,
                toothCoils.phaseCoils(), 4, 4, toothCoils.parallelPathCoils(), toothCoils.windingFactors());
        mine.clear();
        assertEquals(12, copy.coils().size());
    }

    @Test
    void an_inconsistent_winding_cannot_be_built() {
        assertThrows(IllegalArgumentException.class, () -> new Winding(toothCoils.spec(), toothCoils.q(), 1, 60, 2,
                150, 1, toothCoils.coils(), toothCoils.phaseCoils(), 5, 5, toothCoils.parallelPathCoils(),
                toothCoils.windingFactors()));
    }

    @Test
    void coil_lookup_and_phase_names_check_their_range() {
        assertEquals(12, toothCoils.coil(12).number());
        assertThrows(IllegalArgumentException.class, () -> toothCoils.coil(13));
        assertEquals("C", Winding.phaseName(2));
        assertThrows(IllegalArgumentException.class, () -> Winding.phaseName(6));
    }
}
