package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class WireSpecTest {

    @Test
    void awg_wire_takes_its_diameter_from_the_gauge_and_ignores_a_given_one() {
        WireSpec w = new WireSpec(WireGauge.AWG, 18, 5e-3, 1, 1);
        assertEquals(WireSize.awgDiameterM(18), w.bareDiameterM(), 0.0);
        assertEquals(w, WireSpec.awg(18, 1));
    }

    @Test
    void metric_wire_clears_the_awg_number() {
        WireSpec w = new WireSpec(WireGauge.METRIC, 12, 1.25e-3, 2, 1);
        assertEquals(0, w.awg());
        assertEquals(1.25e-3, w.bareDiameterM(), 0.0);
    }

    @Test
    void areas_follow_the_diameter_and_the_strand_count() {
        WireSpec w = WireSpec.metric(1.0e-3, 1).withStrands(3);
        assertEquals(Math.PI / 4 * 1e-6, w.copperAreaM2(), 1e-18);
        assertEquals(3 * Math.PI / 4 * 1e-6, w.conductorCopperAreaM2(), 1e-18);
        assertEquals(3 * Math.PI / 4 * 1.062e-3 * 1.062e-3, w.conductorOverallAreaM2(), 1e-15);
        assertEquals(1.062e-3, w.overallDiameterM(), 1e-12);
    }

    @Test
    void labels_name_the_size_and_the_strands() {
        assertEquals("AWG 18", WireSpec.awg(18, 2).label());
        assertEquals("1.25 mm", WireSpec.metric(1.25e-3, 2).label());
        assertEquals("1.00 mm", WireSpec.metric(1.0e-3, 2).label());
        assertEquals("0.224 mm", WireSpec.metric(0.224e-3, 2).label());
        assertEquals("3 x AWG 20", WireSpec.awg(20, 1).withStrands(3).label());
    }

    @Test
    void rejects_awg_out_of_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> WireSpec.awg(50, 1));
        assertEquals("awg = 50: must be between 4 and 40", e.getMessage());
    }

    @Test
    void rejects_metric_diameter_out_of_range_with_the_allowed_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> WireSpec.metric(3.5e-3, 1));
        assertEquals("bareDiameterM", e.errors().get(0).field());
        assertEquals("1.0E-4 to 0.003", e.errors().get(0).allowed());
        assertThrows(InvalidInputException.class, () -> WireSpec.metric(0.05e-3, 1));
        assertThrows(InvalidInputException.class, () -> WireSpec.metric(Double.NaN, 1));
    }

    @Test
    void accepts_the_ends_of_the_metric_range() {
        assertDoesNotThrow(() -> WireSpec.metric(WireSize.MIN_METRIC_DIAMETER_M, 1));
        assertDoesNotThrow(() -> WireSpec.metric(WireSize.MAX_METRIC_DIAMETER_M, 2));
    }

    @Test
    void reports_every_bad_field_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new WireSpec(WireGauge.AWG, 2, 0, 0, 0));
        List<String> fields = e.errors().stream().map(f -> f.field()).toList();
        assertEquals(List.of("awg", "insulationGrade", "strandsInHand"), fields);
        assertEquals("strandsInHand = 0: must be between 1 and 40", e.errors().get(2).message());
    }

    @Test
    void rejects_missing_gauge() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new WireSpec(null, 18, 0, 1, 1));
        assertEquals("gauge", e.errors().get(0).field());
    }
}
