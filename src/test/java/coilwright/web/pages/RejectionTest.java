package coilwright.web.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Set;
import org.junit.jupiter.api.Test;

class RejectionTest {
    private static final Set<String> FORM = Set.of("alternator.winding.slots", "alternator.wire.awg",
            "alternator.wire.gauge", "load.battery.cells");

    @Test
    void a_choice_outside_the_request_keeps_its_name() {
        assertEquals("topology", Rejection.onForm("topology", Set.of("topology", "alternator.winding.slots")));
    }

    @Test
    void a_full_path_is_kept() {
        assertEquals("load.battery.cells", Rejection.onForm("load.battery.cells", FORM));
    }

    @Test
    void a_whole_part_lands_on_its_first_field_in_name_order() {
        assertEquals("alternator.wire.awg", Rejection.onForm("alternator.wire", FORM));
    }

    @Test
    void a_reason_without_a_field_stays_a_form_level_message() {
        assertEquals("", Rejection.onForm("", FORM));
        assertEquals("alternator.unknownPart", Rejection.onForm("alternator.unknownPart", FORM));
    }
}
