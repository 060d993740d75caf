package coilwright.web.winding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import coilwright.winding.Coil;
import coilwright.winding.Layers;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class RingDiagramTest {
    private static int count(String text, String regex) {
        return (int) Pattern.compile(regex).matcher(text).results().count();
    }

    @Test
    void a_double_layer_ring_draws_two_sides_per_slot_and_one_curve_per_coil() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        String svg = RingDiagram.svg(w);
        assertEquals(24, count(svg, "class=\"ring-side\""));
        assertEquals(12, count(svg, "class=\"ring-coil\""));
        for (int slot = 1; slot <= 12; slot++) {
            assertEquals(2, count(svg, "class=\"ring-side\" data-slot=\"" + slot + "\""), "slot " + slot);
        }
    }

    @Test
    void current_direction_is_shown_by_dots_and_crosses_not_by_plus_and_minus_signs() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        String svg = RingDiagram.svg(w);
        // a forward coil's current goes away from the connection end in its start side and comes back in its return side;
        // a reversed coil the other way round: every coil has one side of each
        int away = w.coils().size();
        assertEquals(away, count(svg, "data-direction=\"away\""));
        assertEquals(away, count(svg, "data-direction=\"towards\""));
        for (Coil c : w.coils()) {
            String expected = c.polarity() > 0 ? "away" : "towards";
            assertEquals(1, count(svg, "data-slot=\"" + c.goSlot() + "\" data-coil=\"" + c.number()
                    + "\" data-direction=\"" + expected + "\""), "coil " + c.number());
        }
        assertFalse(svg.contains("+A") || svg.contains("−A") || svg.contains("-A"));
    }

    @Test
    void a_single_layer_ring_draws_one_side_per_slot() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 1, Layers.SINGLE));
        String svg = RingDiagram.svg(w);
        assertEquals(12, count(svg, "class=\"ring-side\""));
        assertEquals(w.coils().size(), count(svg, "class=\"ring-coil\""));
    }
}
