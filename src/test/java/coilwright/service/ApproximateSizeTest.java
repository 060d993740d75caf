package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class ApproximateSizeTest {
    record Point(double speedRpm, double powerW, int index) {
    }

    record Curve(String name, List<Point> points, Optional<Point> best) {
    }

    @Test
    void a_record_counts_its_header_and_its_fields() {
        // header 16, two doubles 8 + 8, one int 4
        assertEquals(36, ApproximateSize.of(new Point(1, 2, 3)));
    }

    @Test
    void a_list_grows_linearly_with_its_elements() {
        long ten = ApproximateSize.of(new Curve("c", java.util.Collections.nCopies(10, new Point(1, 2, 3)), Optional.empty()));
        long hundred = ApproximateSize.of(new Curve("c", java.util.Collections.nCopies(100, new Point(1, 2, 3)), Optional.empty()));
        long perPoint = ApproximateSize.REFERENCE + 36;
        assertEquals(90 * perPoint, hundred - ten);
    }

    @Test
    void strings_optionals_and_nulls_are_counted() {
        assertTrue(ApproximateSize.of("abcdef") > ApproximateSize.of("a"));
        assertTrue(ApproximateSize.of(Optional.of(new Point(0, 0, 0))) > ApproximateSize.of(Optional.empty()));
        assertEquals(0, ApproximateSize.of(null));
    }

    @Test
    void a_real_evaluation_weighs_in_proportion_to_its_points() throws Exception {
        var request = EvaluationServiceTest.resistiveAxial();
        var service = new EvaluationService(new ResultCache(0));
        long eleven = ApproximateSize.of(service.evaluate(request));
        var more = new coilwright.system.EvaluationRequest(request.alternator(), request.load(),
                new coilwright.system.SpeedRange(0, 500, 101), 0, 0);
        long hundredOne = ApproximateSize.of(service.evaluate(more));
        long perPoint = (hundredOne - eleven) / 90;
        // a speed point holds about twenty doubles: between 100 and 1000 bytes
        assertTrue(perPoint > 100 && perPoint < 1000, "bytes per speed point: " + perPoint);
        assertTrue(eleven > 1000, "the machine alone holds more than a kilobyte: " + eleven);
    }
}
