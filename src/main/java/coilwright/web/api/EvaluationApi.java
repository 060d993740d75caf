package coilwright.web.api;

import coilwright.service.EvaluationService;
import coilwright.service.ExampleCatalogue;
import coilwright.system.EvaluationRequest;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import coilwright.winding.WindingSpec;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import io.javalin.http.ContentType;
import io.javalin.http.Context;
import java.io.UncheckedIOException;

/**
 * The JSON API of designs: evaluate a design, lay out a winding, the catalogues and the example designs. Handlers
 * only bind, call the service and write; errors are thrown and mapped by {@code ErrorMapping} (400 invalid input
 * listing every field, 422 infeasible design or solver failure, 404 unknown example, 413 body too large).
 */
public final class EvaluationApi {
    public static final String PREFIX = "/api/v1";

    private final EvaluationService evaluation;
    private final ExampleCatalogue examples;
    private final RecordBinder binder;
    /** A 200-point evaluation is about 130 kB of JSON: Jackson's shortest-digits writer makes it noticeably faster. */
    private final ObjectWriter writer;

    public EvaluationApi(EvaluationService evaluation, ExampleCatalogue examples, RecordBinder binder, ObjectMapper mapper) {
        this.evaluation = evaluation;
        this.examples = examples;
        this.binder = binder;
        this.writer = mapper.writer().with(StreamWriteFeature.USE_FAST_DOUBLE_WRITER);
    }

    /** {@code POST /api/v1/evaluate}. */
    public void evaluate(Context ctx) {
        try {
            byte[] body = writer.writeValueAsBytes(evaluation.evaluate(binder.bind(ctx.body(), EvaluationRequest.class)));
            ctx.contentType(ContentType.APPLICATION_JSON).result(body);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** {@code POST /api/v1/winding}. */
    public void winding(Context ctx) {
        ctx.json(evaluation.layout(binder.bind(ctx.body(), WindingSpec.class)));
    }

    /** {@code GET /api/v1/catalogue}. */
    public void catalogue(Context ctx) {
        ctx.json(evaluation.catalogue());
    }

    /** {@code GET /api/v1/examples}: one summary per example, sorted by slug. */
    public void examples(Context ctx) {
        ctx.json(examples.all().stream().map(e -> new ExampleSummary(e.slug(), e.title(), e.document().notes(),
                PREFIX + "/examples/" + e.slug())).toList());
    }

    /** {@code GET /api/v1/examples/{slug}}: the example's design document. */
    public void example(Context ctx) {
        String slug = ctx.pathParam("slug");
        ctx.json(examples.find(slug).orElseThrow(() -> new NotFoundException("There is no example named '" + slug
                + "'. The examples are: " + String.join(", ", examples.slugs()) + ".")).document());
    }
}
