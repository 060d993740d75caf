package coilwright.web.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;

import coilwright.service.EvaluationService;
import coilwright.service.ExampleCatalogue;
import coilwright.web.Json;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class WarmUpTest {
    private static final ExampleCatalogue EXAMPLES = ExampleCatalogue.read(WarmUpTest.class.getClassLoader(), Json.mapper());

    @Test
    void every_example_is_evaluated_and_its_results_page_rendered_in_each_round() {
        int n = WarmUp.run(new EvaluationService(), EXAMPLES, new ThymeleafRenderer(), () -> true);
        assertEquals(WarmUp.ROUNDS * EXAMPLES.all().size(), n);
    }

    @Test
    void it_stops_between_steps_once_the_service_is_stopping() {
        AtomicInteger asked = new AtomicInteger();
        int n = WarmUp.run(new EvaluationService(), EXAMPLES, new ThymeleafRenderer(), () -> asked.incrementAndGet() <= 1);
        assertEquals(1, n, "one page, then the stop is seen");
    }
}
