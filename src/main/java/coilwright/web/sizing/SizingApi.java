package coilwright.web.sizing;

import coilwright.service.SizingAnswer;
import coilwright.service.SizingJob;
import coilwright.service.SizingJobs;
import coilwright.sizing.SizingRequest;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;
import io.javalin.http.sse.SseClient;
import io.javalin.http.sse.SseHandler;

import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Design from requirements over JSON: {@code POST /api/v1/sizing} answers a small search inline (200) and starts a
 * job for a large one, or when the client sends {@code Prefer: respond-async} (RFC 7240), answering 202 with the
 * job and its {@code Location}; {@code GET /api/v1/sizing/jobs/{jobId}} reads a job, {@code DELETE} cancels it, and
 * {@code GET /api/v1/sizing/jobs/{jobId}/events} sends its progress as server-sent events until it ends.
 */
public final class SizingApi {
    public static final String JOBS = "/api/v1/sizing/jobs/";
    /** Progress listeners at once (a soft cap); each is one open connection, served by one shared timer thread. */
    static final int MAX_LISTENERS = 64;
    private static final long EVENT_PERIOD_MS = 500;

    private final ScheduledExecutorService ticks = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "coilwright-sizing-events");
        t.setDaemon(true);
        return t;
    });
    private final AtomicInteger listeners = new AtomicInteger();

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

    /**
     * {@code GET /api/v1/sizing/jobs/{jobId}/events}: a {@code progress} event (the job without its result) every
     * half second while it runs, then one {@code end} event with its final status; the stream then closes.
     */
    public void events(Context ctx) throws Exception {
        String id = ctx.pathParam("jobId");
        sizing.find(id).orElseThrow(() -> unknown(ctx));
        if (listeners.get() >= MAX_LISTENERS) {
            throw new coilwright.service.SizingBusyException(MAX_LISTENERS + " clients are following searches, as many "
                    + "as this service serves; read the job with GET " + JOBS + id + " instead", 5);
        }
        new SseHandler(client -> follow(client, id)).handle(ctx);
    }

    /** Counted here, not before: Javalin calls this only for a client that accepts an event stream. */
    private void follow(SseClient client, String id) {
        listeners.incrementAndGet();
        client.keepAlive();
        AtomicReference<ScheduledFuture<?>> task = new AtomicReference<>();
        Runnable stop = () -> {
            ScheduledFuture<?> t = task.getAndSet(null);
            if (t != null) {
                t.cancel(false);
                listeners.decrementAndGet();
            }
        };
        client.onClose(stop);
        task.set(ticks.scheduleAtFixedRate(() -> {
            try {
                SizingJob job = sizing.find(id).orElse(null);
                if (client.terminated() || job == null) {
                    stop.run();
                    client.close();
                    return;
                }
                client.sendEvent("progress", job.withoutResult());
                if (job.finished()) {
                    client.sendEvent("end", job.status().name());
                    stop.run();
                    client.close();
                }
            } catch (RuntimeException gone) {
                // the client went away mid-write: stop following (a throw would end the timer task silently)
                stop.run();
            }
        }, 0, EVENT_PERIOD_MS, TimeUnit.MILLISECONDS));
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
