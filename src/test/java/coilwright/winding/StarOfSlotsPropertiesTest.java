package coilwright.winding;

import coilwright.validation.InfeasibleDesignException;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.util.ArithmeticUtils;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/** Properties of every balanced layout over random slot/pole combinations. */
class StarOfSlotsPropertiesTest {
    static final double TOL = 1e-9;

    /** Lays out, or returns null when the only refusal is a too-low fundamental factor. */
    static Winding layoutOrNullIfFactorTooLow(WindingSpec spec) {
        try {
            return StarOfSlots.layout(spec);
        } catch (InfeasibleDesignException e) {
            assertTrue(e.getMessage().contains("fundamental winding factor"),
                    "a combination meeting the balance condition was refused: " + e.getMessage());
            return null;
        }
    }

    @Property(tries = 300)
    void double_layer_three_phase_layouts_are_balanced_and_physical(
            @ForAll @IntRange(min = 1, max = 40) int slotsThirds, @ForAll @IntRange(min = 1, max = 60) int polePairs) {
        int slots = 3 * slotsThirds;
        Assume.that(slots >= 2 && slots % (3 * ArithmeticUtils.gcd(slots, polePairs)) == 0);
        Winding w = layoutOrNullIfFactorTooLow(WindingSpec.of(slots, 2 * polePairs, 3, Layers.DOUBLE));
        Assume.that(w != null);
        checkPhysical(w);
    }

    @Property(tries = 200)
    void single_layer_and_single_phase_layouts_are_balanced_and_physical(
            @ForAll @IntRange(min = 1, max = 60) int slotsHalves, @ForAll @IntRange(min = 1, max = 60) int polePairs,
            @ForAll boolean singlePhase) {
        int slots = 2 * slotsHalves;
        int phases = singlePhase ? 1 : 3;
        Assume.that(slots >= 2 && (slots / 2) % (phases * ArithmeticUtils.gcd(slots / 2, polePairs)) == 0);
        Winding w = layoutOrNullIfFactorTooLow(WindingSpec.of(slots, 2 * polePairs, phases, Layers.SINGLE));
        Assume.that(w != null);
        checkPhysical(w);
    }

    @Property(tries = 300)
    void the_closed_form_balance_condition_and_the_numerical_check_agree(
            @ForAll @IntRange(min = 2, max = 90) int slots, @ForAll @IntRange(min = 1, max = 45) int polePairs) {
        boolean formula = slots % (3 * ArithmeticUtils.gcd(slots, polePairs)) == 0;
        WindingSpec spec = WindingSpec.of(slots, 2 * polePairs, 3, Layers.DOUBLE);
        if (!formula) {
            InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> StarOfSlots.layout(spec));
            assertTrue(e.getMessage().contains("Q/(m*t)"), e.getMessage());
        } else {
            Winding w = layoutOrNullIfFactorTooLow(spec);
            if (w != null) {
                assertTrue(w.fundamentalWindingFactor() >= StarOfSlots.MIN_FUNDAMENTAL_FACTOR);
            }
        }
    }

    @Property(tries = 100)
    void skew_never_raises_a_factor(@ForAll @IntRange(min = 0, max = 100) int skewHundredths) {
        Winding plain = StarOfSlots.layout(WindingSpec.of(36, 4, 3, Layers.DOUBLE));
        Winding skewed = StarOfSlots.layout(plain.spec().withSkewSlotPitches(skewHundredths / 100.0));
        for (int v : Winding.HARMONIC_ORDERS) {
            assertEquals(plain.harmonic(v).windingFactor(), skewed.harmonic(v).windingFactor(), TOL);
            assertTrue(skewed.harmonic(v).totalFactor() <= plain.harmonic(v).totalFactor() + TOL);
        }
    }

    static void checkPhysical(Winding w) {
        WindingSpec s = w.spec();
        int slots = s.slots();
        int m = s.phases();
        double kw1 = w.fundamentalWindingFactor();
        assertTrue(kw1 > 0 && kw1 <= 1 + TOL, "kw1 = " + kw1);
        for (HarmonicFactor h : w.windingFactors()) {
            assertTrue(h.windingFactor() >= 0 && h.windingFactor() <= 1 + TOL, "order " + h.order());
            assertFalse(Double.isNaN(h.totalFactor()));
        }
        int[] sides = new int[slots + 1];
        for (Coil c : w.coils()) {
            sides[c.goSlot()]++;
            sides[c.returnSlot()]++;
        }
        for (int k = 1; k <= slots; k++) {
            assertEquals(s.layers().sidesPerSlot(), sides[k], "coil sides in slot " + k);
        }
        assertEquals(s.layers().coilCount(slots), w.coils().size());
        Complex[] sum = new Complex[m];
        for (int ph = 0; ph < m; ph++) {
            List<Integer> coils = w.phaseCoils().get(ph);
            assertEquals(w.coilsPerPhase(), coils.size(), "coils in phase " + ph);
            sum[ph] = Complex.ZERO;
            for (int n : coils) {
                sum[ph] = sum[ph].add(StarOfSlotsTest.coilPhasor(w.coil(n), slots, s.poles()));
            }
        }
        assertEquals(kw1, sum[0].abs() / (2.0 * w.coilsPerPhase()), 1e-7, "independent kw1");
        for (int ph = 1; ph < m; ph++) {
            Complex expected = sum[0].multiply(Complex.I.multiply(2 * Math.PI * ph / m).exp());
            assertEquals(0.0, sum[ph].subtract(expected).abs(), 1e-7 * sum[0].abs(), "phase " + ph + " balance");
        }
    }
}
