package coilwright.web.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.winding.Layers;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class WindingDiagramTest {
    private static int count(String text, String regex) {
        return (int) Pattern.compile(regex).matcher(text).results().count();
    }

    @Test
    void a_double_layer_winding_draws_two_sides_per_slot_and_one_curve_per_coil() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        String svg = WindingDiagram.svg(w);
        assertEquals(24, count(svg, "class=\"side\""));
        assertEquals(12, count(svg, "class=\"coil\""));
        for (int slot = 1; slot <= 12; slot++) {
            assertEquals(2, count(svg, "data-slot=\"" + slot + "\""), "slot " + slot);
        }
    }

    @Test
    void reversed_coils_are_dashed_and_forward_coils_are_not() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        long reversed = w.coils().stream().filter(c -> c.polarity() < 0).count();
        assertTrue(reversed > 0 && reversed < 12, "12s/10p has coils of both polarities");
        assertEquals(reversed, count(WindingDiagram.svg(w), "class=\"coil\"[^>]*stroke-dasharray"));
    }

    @Test
    void a_single_layer_winding_draws_one_side_per_slot_and_a_single_phase_legend() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 1, Layers.SINGLE));
        String svg = WindingDiagram.svg(w);
        assertEquals(12, count(svg, "class=\"side\""));
        assertEquals(w.coils().size(), count(svg, "class=\"coil\""));
        assertTrue(svg.contains("Phase A") && !svg.contains("Phase B"));
        assertTrue(svg.contains("One coil side per slot."));
    }
}
