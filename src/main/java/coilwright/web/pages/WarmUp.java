package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.service.ExampleCatalogue;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.units.Units;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamWriteFeature;
import java.util.function.BooleanSupplier;

/**
 * Runs what the first requests would run (binding a JSON design, evaluating it, writing the result as JSON, building
 * and rendering the results page) for every example, in the background after the socket listens, so the first user
 * request does not pay for class loading and the JIT's first pass. In process: no request is made, nothing is
 * counted and nothing is stored. Each example is evaluated with its top speed 1 rpm higher, so the examples' own
 * results are not put in the cache ahead of the user: a first request still computes.
 */
public final class WarmUp {
    /** Passes over the examples: the first loads and interprets, the next ones get the hot paths compiled. */
    static final int ROUNDS = 3;

    private WarmUp() {
    }

    /**
     * @param carryOn false once the service is stopping; checked between steps
     * @return the number of example pages rendered
     */
    public static int run(EvaluationService service, ExampleCatalogue examples, ThymeleafRenderer renderer,
                          BooleanSupplier carryOn) {
        RecordBinder binder = new RecordBinder(Json.mapper());
        var writer = Json.mapper().writer().with(StreamWriteFeature.USE_FAST_DOUBLE_WRITER);
        int rendered = 0;
        for (int round = 0; round < ROUNDS; round++) {
            for (ExampleCatalogue.Example example : examples.all()) {
                if (!carryOn.getAsBoolean()) {
                    return rendered;
                }
                try {
                    EvaluationRequest request = binder.bind(Json.mapper().writeValueAsString(
                            aside(example.document().design())), EvaluationRequest.class);
                    var evaluation = service.evaluate(request);
                    writer.writeValueAsBytes(evaluation);
                    renderer.render("results", ResultsModel.of(example.title(), request, evaluation, Units.SI),
                            "/design/results", "/design/results?example=" + example.slug(), Units.SI);
                    rendered++;
                } catch (JsonProcessingException | RuntimeException e) {
                    // an example that fails here fails for the user too, with its own message; start-up goes on
                    return rendered;
                }
            }
        }
        return rendered;
    }

    private static EvaluationRequest aside(EvaluationRequest r) {
        SpeedRange s = r.speedRange();
        return new EvaluationRequest(r.alternator(), r.load(), new SpeedRange(s.minRpm(), s.maxRpm() + 1, s.points()),
                r.ratedSpeedRpm(), r.maxSpeedRpm());
    }
}
