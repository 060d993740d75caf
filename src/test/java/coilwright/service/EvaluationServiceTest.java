package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.load.Cable;
import coilwright.load.ResistiveLoad;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.Json;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import java.io.IOException;
import java.io.InputStream;
import org.junit.jupiter.api.Test;

class EvaluationServiceTest {

    /** The axial example with resistors in place of the battery: every point is solved directly. */
    static EvaluationRequest resistiveAxial() throws IOException {
        try (InputStream in = EvaluationServiceTest.class.getClassLoader().getResourceAsStream("examples/axial-wind-48v.json")) {
            EvaluationRequest d = Json.mapper().readValue(in, DesignDocument.class).design();
            return new EvaluationRequest(d.alternator(), new ResistiveLoad(2.0, Cable.NONE), new SpeedRange(0, 500, 11), 0, 0);
        }
    }

    @Test
    void equal_requests_are_answered_from_the_cache() throws IOException {
        EvaluationService service = new EvaluationService();
        AlternatorEvaluation first = service.evaluate(resistiveAxial());
        AlternatorEvaluation second = service.evaluate(resistiveAxial());
        assertSame(first, second, "a separately built but equal request hits the cache");
    }

    @Test
    void without_a_cache_the_same_numbers_are_computed_again() throws IOException {
        EvaluationService service = new EvaluationService(new ResultCache(0));
        AlternatorEvaluation first = service.evaluate(resistiveAxial());
        AlternatorEvaluation second = service.evaluate(resistiveAxial());
        assertNotSame(first, second);
        assertEquals(first, second, "evaluation is a pure function of the request");
    }

    @Test
    void a_different_request_is_evaluated_anew() throws IOException {
        EvaluationService service = new EvaluationService();
        EvaluationRequest r = resistiveAxial();
        AlternatorEvaluation a = service.evaluate(r);
        AlternatorEvaluation b = service.evaluate(new EvaluationRequest(r.alternator().withTurnsPerCoil(20), r.load(),
                r.speedRange(), 0, 0));
        assertTrue(b.alternator().keLineRmsVPerRpm() < a.alternator().keLineRmsVPerRpm(), "fewer turns, less EMF");
    }

    @Test
    void an_unbalanced_winding_names_its_field_in_the_request() throws IOException {
        EvaluationRequest r = resistiveAxial();
        EvaluationRequest bad = new EvaluationRequest(r.alternator().withWinding(WindingSpec.of(12, 12, 3, Layers.DOUBLE)),
                r.load(), r.speedRange(), 0, 0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> new EvaluationService().evaluate(bad));
        assertEquals("alternator.winding.slots", e.field());
    }

    @Test
    void wire_that_cannot_fit_names_its_field_in_the_request() throws IOException {
        EvaluationRequest r = resistiveAxial();
        EvaluationRequest bad = new EvaluationRequest(r.alternator().withTurnsPerCoil(2000), r.load(), r.speedRange(), 0, 0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> new EvaluationService().evaluate(bad));
        assertEquals("alternator.wire", e.field());
    }

    @Test
    void layout_errors_found_while_evaluating_are_placed_under_alternator() throws IOException {
        EvaluationRequest r = resistiveAxial();
        EvaluationRequest bad = new EvaluationRequest(r.alternator().withWinding(r.alternator().winding().withParallelPaths(3)),
                r.load(), r.speedRange(), 0, 0);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new EvaluationService().evaluate(bad));
        assertEquals("alternator.winding.parallelPaths", e.errors().get(0).field());
        assertTrue(e.errors().get(0).message().startsWith("alternator.winding.parallelPaths = 3:"), e.getMessage());
    }

    @Test
    void evaluations_share_the_cache_they_are_given() throws IOException {
        ResultCache cache = new ResultCache(ResultCache.DEFAULT_BUDGET_BYTES);
        AlternatorEvaluation first = new EvaluationService(cache).evaluate(resistiveAxial());
        AlternatorEvaluation second = new EvaluationService(cache).evaluate(resistiveAxial());
        assertSame(first, second, "a second service over the same cache answers from it");
        assertEquals(1, cache.size());
    }

    @Test
    void the_winding_layout_and_catalogue_are_served() {
        EvaluationService service = new EvaluationService();
        assertEquals(0.9330, service.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE)).fundamentalWindingFactor(), 1e-4);
        assertSame(service.catalogue(), service.catalogue(), "built once");
    }
}
