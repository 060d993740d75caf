package coilwright.winding;

import coilwright.validation.InfeasibleDesignException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Winding factors against published values and closed-form textbook formulas.
 * <ul>
 *   <li>Tooth-coil (fractional-slot concentrated) windings: A. M. El-Refaie, "Fractional-slot concentrated-windings
 *       synchronous permanent magnet machines: opportunities and challenges", IEEE Trans. Ind. Electron. 57(1),
 *       2010, tables of fundamental winding factors for double- and single-layer windings (printed to 3 or 4
 *       decimals).</li>
 *   <li>Distributed windings: distribution factor kd = sin(q*v*alpha/2)/(q*sin(v*alpha/2)) and pitch factor
 *       kp = sin(v*(y/tau)*pi/2), e.g. J. R. Hendershot and T. J. E. Miller, "Design of Brushless Permanent-Magnet
 *       Machines", 2010, and J. Pyrhonen, T. Jokinen, V. Hrabovcova, "Design of Rotating Electrical Machines",
 *       Wiley 2008, ch. 2.</li>
 * </ul>
 */
class StarOfSlotsReferenceTest {
    /** Published figures carry 4 decimals: half a unit in the last place plus rounding slack. */
    static final double TABLE_TOLERANCE = 6e-5;
    static final double CLOSED_FORM_TOLERANCE = 1e-9;

    static Winding layout(int slots, int poles, Layers layers, int pitch) {
        return StarOfSlots.layout(new WindingSpec(slots, poles, 3, layers, pitch, 1, 0.0));
    }

    @ParameterizedTest(name = "{0} slots / {1} poles double layer: kw1 = {2}")
    @DisplayName("double-layer tooth-coil kw1 agrees with El-Refaie 2010, IEEE TIE 57(1), table of winding factors")
    @CsvSource({"9, 8, 0.9452", "9, 10, 0.9452", "12, 10, 0.9330", "12, 14, 0.9330", "9, 6, 0.8660",
            "12, 8, 0.8660", "6, 4, 0.8660", "24, 22, 0.9495", "21, 20, 0.9531"})
    void double_layer_tooth_coil_factors_match_the_published_table(int slots, int poles, double kw1) {
        Winding w = layout(slots, poles, Layers.DOUBLE, 0);
        assertEquals(1, w.coilPitchSlots(), "tooth coils by default where q < 1");
        assertEquals(kw1, w.fundamentalWindingFactor(), TABLE_TOLERANCE);
    }

    @Test
    @DisplayName("single-layer 12 slots / 10 poles kw1 = 0.9659: El-Refaie 2010 and Bianchi and Dai Pre 2006")
    void single_layer_twelve_slots_ten_poles_matches_the_published_value() {
        Winding w = layout(12, 10, Layers.SINGLE, 0);
        assertEquals(0.9659, w.fundamentalWindingFactor(), TABLE_TOLERANCE);
        assertEquals(6, w.coils().size());
    }

    @Test
    @DisplayName("single-layer 24 slots / 22 poles kw1 = 0.958 (El-Refaie 2010, 3 decimals, from memory)")
    void single_layer_twenty_four_slots_twenty_two_poles_matches_the_published_value() {
        assertEquals(0.958, layout(24, 22, Layers.SINGLE, 0).fundamentalWindingFactor(), 6e-4);
    }

    @ParameterizedTest(name = "{0} slots / {1} poles, pitch {2}: kw1 = {3}")
    @DisplayName("distributed windings agree with the textbook kd*kp values")
    @CsvSource({"24, 4, 0, 0.9659", "24, 4, 5, 0.9330", "36, 4, 0, 0.9598"})
    void distributed_windings_match_the_textbook_values(int slots, int poles, int pitch, double kw1) {
        assertEquals(kw1, layout(slots, poles, Layers.DOUBLE, pitch).fundamentalWindingFactor(), TABLE_TOLERANCE);
    }

    @ParameterizedTest(name = "{0} slots / {1} poles, pitch {2}, {3} layer")
    @DisplayName("every odd harmonic of integer-q windings equals the closed-form product kd*kp")
    @CsvSource({"24, 4, 5, DOUBLE", "24, 4, 6, DOUBLE", "36, 4, 7, DOUBLE", "36, 4, 8, DOUBLE", "48, 4, 10, DOUBLE",
            "24, 4, 6, SINGLE", "36, 4, 9, SINGLE", "18, 2, 9, SINGLE"})
    void harmonic_factors_equal_the_distribution_times_pitch_product(int slots, int poles, int pitch, Layers layers) {
        Winding w = layout(slots, poles, layers, pitch);
        int q = slots / (poles * 3);
        double alpha = 2 * Math.PI * (poles / 2) / slots;
        double pitchRatio = pitch / ((double) slots / poles);
        for (int v : Winding.HARMONIC_ORDERS) {
            double kd = Math.sin(q * v * alpha / 2) / (q * Math.sin(v * alpha / 2));
            double kp = Math.sin(v * pitchRatio * Math.PI / 2);
            assertEquals(Math.abs(kd * kp), w.harmonic(v).windingFactor(), CLOSED_FORM_TOLERANCE, "order " + v);
        }
    }

    @Test
    @DisplayName("kw5 and kw7 of q = 2 with 5/6 pitch: kd5*kp5 = 0.0670, kd7*kp7 = 0.0670 (textbook)")
    void the_five_sixths_pitch_winding_suppresses_fifth_and_seventh_harmonics() {
        Winding w = layout(24, 4, Layers.DOUBLE, 5);
        double kd5 = Math.sin(5 * Math.PI / 6) / (2 * Math.sin(5 * Math.PI / 12));
        double kp5 = Math.sin(5 * 5.0 / 6 * Math.PI / 2);
        double kd7 = Math.sin(7 * Math.PI / 6) / (2 * Math.sin(7 * Math.PI / 12));
        double kp7 = Math.sin(7 * 5.0 / 6 * Math.PI / 2);
        assertEquals(Math.abs(kd5 * kp5), w.harmonic(5).windingFactor(), CLOSED_FORM_TOLERANCE);
        assertEquals(Math.abs(kd7 * kp7), w.harmonic(7).windingFactor(), CLOSED_FORM_TOLERANCE);
        assertEquals(0.0670, w.harmonic(5).windingFactor(), TABLE_TOLERANCE);
    }

    @Test
    @DisplayName("tooth-coil kw = kd * kp with kp = sin(alpha/2) for 9 slots / 8 poles (El-Refaie 2010, eq. for kp)")
    void tooth_coil_factor_splits_into_pitch_and_distribution() {
        Winding w = layout(9, 8, Layers.DOUBLE, 0);
        double kp = Math.sin(Math.toRadians(160) / 2);
        // three coil phasors 20 electrical degrees apart
        double kd = Math.sin(3 * Math.toRadians(20) / 2) / (3 * Math.sin(Math.toRadians(20) / 2));
        assertEquals(kp * kd, w.fundamentalWindingFactor(), CLOSED_FORM_TOLERANCE);
    }

    @Test
    @DisplayName("skew of one slot pitch: ks_v = sin(v*alpha/2)/(v*alpha/2) (textbook skew factor)")
    void skew_of_one_slot_pitch_gives_the_sinc_factor() {
        Winding w = StarOfSlots.layout(new WindingSpec(36, 4, 3, Layers.DOUBLE, 0, 1, 1.0));
        double alpha = 2 * Math.PI * 2 / 36;
        for (int v : Winding.HARMONIC_ORDERS) {
            double x = v * alpha / 2;
            HarmonicFactor h = w.harmonic(v);
            assertEquals(Math.abs(Math.sin(x) / x), h.skewFactor(), CLOSED_FORM_TOLERANCE, "order " + v);
            assertEquals(h.windingFactor() * h.skewFactor(), h.totalFactor(), CLOSED_FORM_TOLERANCE);
        }
        assertEquals(0.9949, w.harmonic(1).skewFactor(), TABLE_TOLERANCE);
    }

    @ParameterizedTest(name = "{0} slots / {1} poles three-phase is refused")
    @DisplayName("combinations El-Refaie 2010 marks as not feasible are refused with the reason")
    @CsvSource({"12, 12, 6", "6, 6, 3", "10, 8, 2"})
    void unbalanced_three_phase_combinations_are_refused(int slots, int poles, int t) {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> layout(slots, poles, Layers.DOUBLE, 0));
        assertEquals("slots", e.field());
        assertTrue(e.getMessage().contains("Q/(m*t) = " + slots + "/(3*" + t + ") is not a whole number"),
                e.getMessage());
    }
}
