package coilwright.service;

import coilwright.sizing.SizingRequest;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.concurrent.ForkJoinPool;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SizingJobsTest {
    private final ForkJoinPool pool = new ForkJoinPool(2);
    private final MovableClock clock = new MovableClock();
    private final SizingJobs jobs = new SizingJobs(new SizingService(pool), new SizingJobs.Settings(100,
            Duration.ofSeconds(60), 1, Duration.ofMinutes(15), 50), clock);

    @AfterEach
    void close() {
        jobs.close();
        pool.shutdownNow();
    }

    private static SizingRequest request(String name) throws IOException {
        try (InputStream in = SizingJobsTest.class.getClassLoader().getResourceAsStream("sizing/" + name + ".json")) {
            return new RecordBinder(Json.mapper()).bind(new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8),
                    SizingRequest.class);
        }
    }

    private SizingJob waitFor(String id) throws InterruptedException {
        for (int i = 0; i < 2400; i++) {
            SizingJob job = jobs.find(id).orElseThrow();
            if (job.finished()) {
                return job;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("job " + id + " did not finish");
    }

    @Test
    void a_small_space_is_answered_inline_and_leaves_no_job_behind() throws IOException {
        SizingAnswer answer = jobs.answer(request("small-axial-wind-24v"), false);
        assertTrue(answer.result().isPresent());
        assertEquals(72, answer.result().get().counts().candidatesInSpace());
        assertEquals(0, jobs.running());
    }

    @Test
    void a_space_over_the_inline_size_becomes_a_job_and_one_more_than_allowed_is_refused() throws IOException {
        SizingJob job = jobs.answer(request("axial-wind-24v"), false).job().orElseThrow();
        assertEquals(SizingJob.Status.RUNNING, job.status());
        assertEquals(863_136, job.candidates());
        SizingBusyException busy = assertThrows(SizingBusyException.class,
                () -> jobs.answer(request("small-axial-wind-24v"), true));
        assertTrue(busy.getMessage().startsWith("1 design searches are running"), busy.getMessage());
        assertEquals(SizingJob.Status.CANCELLED, jobs.cancel(job.id()).orElseThrow().status());
        assertEquals(0, jobs.running());
    }

    @Test
    void a_finished_job_is_kept_fifteen_minutes_then_forgotten() throws IOException, InterruptedException {
        String id = jobs.answer(request("small-axial-wind-24v"), true).job().orElseThrow().id();
        SizingJob done = waitFor(id);
        assertEquals(SizingJob.Status.DONE, done.status());
        assertEquals(3, done.result().orElseThrow().designs().size());
        assertEquals(900, done.expiresInS().orElseThrow());
        clock.advance(Duration.ofMinutes(14));
        assertTrue(jobs.find(id).isPresent());
        assertEquals(SizingJob.Status.DONE, jobs.cancel(id).orElseThrow().status(), "a finished job stays as it is");
        clock.advance(Duration.ofMinutes(1));
        assertTrue(jobs.find(id).isEmpty());
    }

    private static final class MovableClock extends Clock {
        private volatile Instant now = Instant.parse("2026-01-01T00:00:00Z");

        void advance(Duration d) {
            now = now.plus(d);
        }

        @Override
        public ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(ZoneId zone) {
            return this;
        }

        @Override
        public Instant instant() {
            return now;
        }
    }
}
