package coilwright.web.api;

import coilwright.service.EvaluationService;
import coilwright.system.EvaluationRequest;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.ObjectWriter;
import io.javalin.http.ContentType;
import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.io.UncheckedIOException;

/**
 * {@code POST /api/v1/evaluate}. The answer is a pure function of the body, and a 200-point evaluation is about
 * 130 kB of JSON, so the bytes of recent answers are kept ({@link ResponseCache}); a body seen before is answered
 * without binding, evaluating or serialising. Doubles are written with Jackson's fast (shortest-digits) writer.
 */
final class EvaluateHandler implements Handler {
    /** About 16 MB of answers: a hundred 200-point evaluations, or sixteen of the largest (1000 points). */
    static final long CACHE_BUDGET_BYTES = 16L * 1024 * 1024;

    private final EvaluationService service;
    private final RecordBinder binder;
    private final ObjectWriter writer = Json.mapper().writer().with(StreamWriteFeature.USE_FAST_DOUBLE_WRITER);
    private final ResponseCache answers;

    EvaluateHandler(EvaluationService service, RecordBinder binder, long cacheBudgetBytes) {
        this.service = service;
        this.binder = binder;
        this.answers = new ResponseCache(cacheBudgetBytes);
    }

    @Override
    public void handle(Context ctx) {
        ctx.contentType(ContentType.APPLICATION_JSON).result(answers.get(ctx.body(), this::answer));
    }

    private byte[] answer(String body) {
        try {
            return writer.writeValueAsBytes(service.evaluate(binder.bind(body, EvaluationRequest.class)));
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
