package coilwright.web.sizing;

import coilwright.service.SizingAnswer;
import coilwright.service.SizingJob;
import coilwright.service.SizingJobs;
import coilwright.sizing.SizingRequest;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;

import java.util.Locale;

/**
 * Design from requirements over JSON: {@code POST /api/v1/sizing} answers a small search inline (200) and starts a
 * job for a large one, or when the client sends {@code Prefer: respond-async} (RFC 7240), answering 202 with the
 * job and its {@code Location}; {@code GET /api/v1/sizing/jobs/{jobId}} reads a job, {@code DELETE} cancels it.
 */
public final class SizingApi {
    public static final String JOBS = "/api/v1/sizing/jobs/";

    private final SizingJobs sizing;
    private final RecordBinder binder;

    public SizingApi(SizingJobs sizing, RecordBinder binder) {
        this.sizing = sizing;
        this.binder = binder;
    }

    /** {@code POST /api/v1/sizing}. */
    public void size(Context ctx) {
        SizingAnswer answer = sizing.answer(binder.bind(ctx.body(), SizingRequest.class), prefersAsync(ctx));
        if (answer.result().isPresent()) {
            ctx.json(answer.result().get());
        } else {
            SizingJob job = answer.job().orElseThrow();
            ctx.status(202).header("Location", JOBS + job.id()).header("Retry-After", "1").json(job);
        }
    }

    /** {@code GET /api/v1/sizing/jobs/{jobId}}. */
    public void job(Context ctx) {
        ctx.json(sizing.find(ctx.pathParam("jobId")).orElseThrow(() -> unknown(ctx)));
    }

    /** {@code DELETE /api/v1/sizing/jobs/{jobId}}. */
    public void cancel(Context ctx) {
        ctx.json(sizing.cancel(ctx.pathParam("jobId")).orElseThrow(() -> unknown(ctx)));
    }

    static boolean prefersAsync(Context ctx) {
        String prefer = ctx.header("Prefer");
        return prefer != null && prefer.toLowerCase(Locale.ROOT).contains("respond-async");
    }

    private static NotFoundException unknown(Context ctx) {
        return new NotFoundException("There is no design search job " + ctx.pathParam("jobId")
                + ": it never existed or was forgotten (finished jobs are kept for 15 minutes).");
    }
}
