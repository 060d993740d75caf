package coilwright.service;

import coilwright.sizing.SizingProgress;
import coilwright.sizing.SizingRequest;
import coilwright.sizing.SizingResult;

import java.security.SecureRandom;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Design searches for the API and the pages. Every search runs as a job that reports progress, can be cancelled,
 * and is forgotten {@link Settings#keepFinished()} after it finished. A small space (at most
 * {@link Settings#inlineMaxCandidates()} candidates) is answered inline when its job finishes within
 * {@link Settings#inlineWait()} (the refinement's cost is not known before screening, so the wait bounds it); a
 * larger one, or one that takes longer, is answered with its job. At most {@link Settings#maxRunningJobs()} searches
 * run at once, inline or not; one more is refused ({@link SizingBusyException}) rather than queued without end.
 */
public final class SizingJobs implements AutoCloseable {
    private static final Logger LOG = LoggerFactory.getLogger(SizingJobs.class);
    private static final SecureRandom RANDOM = new SecureRandom();
    /** Where each stage starts in the whole search's progress (screening and refining take most of the time). */
    private static final double[] STAGE_START = {0.0, 0.05, 0.45, 0.85, 0.95, 1.0};

    /**
     * @param inlineMaxCandidates the largest space answered inline, candidates
     * @param inlineWait          how long an inline answer is waited for before the job is answered instead
     * @param maxRunningJobs      searches running at once, at least 1
     * @param keepFinished        how long a finished job's answer is kept
     * @param maxKept             finished jobs kept at most (the oldest go first)
     */
    public record Settings(long inlineMaxCandidates, Duration inlineWait, int maxRunningJobs, Duration keepFinished,
                           int maxKept) {
        /** 200 000 candidates inline within 15 s, 2 searches at once, jobs kept 15 minutes, at most 50. */
        public static Settings defaults() {
            return new Settings(200_000, Duration.ofSeconds(15), 2, Duration.ofMinutes(15), 50);
        }
    }

    private final SizingService sizing;
    private final Settings settings;
    private final Clock clock;
    private final ExecutorService runner;
    private final Map<String, Job> jobs = new LinkedHashMap<>();
    private final AtomicInteger threads = new AtomicInteger();

    public SizingJobs(SizingService sizing, Settings settings, Clock clock) {
        this.sizing = sizing;
        this.settings = settings;
        this.clock = clock;
        this.runner = Executors.newFixedThreadPool(settings.maxRunningJobs(), r -> {
            Thread t = new Thread(r, "coilwright-sizing-" + threads.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    /**
     * Answers a request inline when its space is small and no job was asked for, else starts a job.
     *
     * @param preferJob start a job whatever the size (the client asked to be answered asynchronously)
     * @throws coilwright.validation.InvalidInputException     a value out of range, or a space over the cap
     * @throws coilwright.validation.InfeasibleDesignException the drive itself cannot work
     * @throws SizingBusyException                             as many jobs as allowed are running
     */
    public SizingAnswer answer(SizingRequest request, boolean preferJob) {
        long candidates = sizing.candidateCount(request);
        Job job = start(request, candidates);
        if (!preferJob && candidates <= settings.inlineMaxCandidates() && job.await(settings.inlineWait())) {
            synchronized (jobs) {
                jobs.remove(job.id);
            }
            if (job.failure != null) {
                throw job.failure;
            }
            if (job.result != null) {
                return new SizingAnswer(Optional.of(job.result), Optional.empty());
            }
        }
        return new SizingAnswer(Optional.empty(), Optional.of(job.view()));
    }

    /** The job with this id, unless unknown or forgotten. */
    public Optional<SizingJob> find(String id) {
        synchronized (jobs) {
            forgetExpired();
            return Optional.ofNullable(jobs.get(id)).map(Job::view);
        }
    }

    /** The request a job is answering, while the job is kept. */
    public Optional<SizingRequest> requestOf(String id) {
        synchronized (jobs) {
            forgetExpired();
            return Optional.ofNullable(jobs.get(id)).map(j -> j.request);
        }
    }

    /** Asks a running job to stop (it stops within one block of work); a finished job is left as it is. */
    public Optional<SizingJob> cancel(String id) {
        synchronized (jobs) {
            forgetExpired();
            Job job = jobs.get(id);
            if (job == null) {
                return Optional.empty();
            }
            job.cancelled = true;
            if (job.status == SizingJob.Status.RUNNING) {
                job.finish(SizingJob.Status.CANCELLED, null, "cancelled by the client", clock.instant());
            }
            return Optional.of(job.view());
        }
    }

    /** Jobs running now. */
    public int running() {
        synchronized (jobs) {
            return (int) jobs.values().stream().filter(j -> j.status == SizingJob.Status.RUNNING).count();
        }
    }

    private Job start(SizingRequest request, long candidates) {
        Job job;
        synchronized (jobs) {
            forgetExpired();
            if (running() >= settings.maxRunningJobs()) {
                throw new SizingBusyException(settings.maxRunningJobs() + " design searches are running, as many as "
                        + "this service runs at once; try again in a minute, or narrow the search so that it has at "
                        + "most " + settings.inlineMaxCandidates() + " candidates and is answered at once", 30);
            }
            job = new Job(newId(), request, candidates);
            jobs.put(job.id, job);
        }
        Job running = job;
        runner.execute(() -> run(running, request));
        return job;
    }

    private void run(Job job, SizingRequest request) {
        try {
            SizingResult result = sizing.size(request, job::progress, () -> job.cancelled);
            finish(job, SizingJob.Status.DONE, result, null);
        } catch (CancellationException e) {
            finish(job, SizingJob.Status.CANCELLED, null, "cancelled by the client");
        } catch (RuntimeException e) {
            String logId = HexFormat.of().formatHex(RANDOM.generateSeed(4));
            LOG.error("design search job {} failed ({})", job.id, logId, e);
            job.failure = e;
            finish(job, SizingJob.Status.FAILED, null, "The search failed unexpectedly. Please report it with the id "
                    + logId + ".");
        } finally {
            job.finished.countDown();
        }
    }

    private void finish(Job job, SizingJob.Status status, SizingResult result, String message) {
        synchronized (jobs) {
            if (job.status == SizingJob.Status.RUNNING) {
                job.finish(status, result, message, clock.instant());
            }
        }
    }

    private void forgetExpired() {
        Instant now = clock.instant();
        jobs.values().removeIf(j -> j.finishedAt != null && !now.isBefore(j.finishedAt.plus(settings.keepFinished())));
        long finished = jobs.values().stream().filter(j -> j.finishedAt != null).count();
        var it = jobs.values().iterator();
        while (finished > settings.maxKept() && it.hasNext()) {
            if (it.next().finishedAt != null) {
                it.remove();
                finished--;
            }
        }
    }

    private static String newId() {
        byte[] bits = new byte[16];
        RANDOM.nextBytes(bits);
        return HexFormat.of().formatHex(bits);
    }

    /** Stops every running job and the threads. */
    @Override
    public void close() {
        synchronized (jobs) {
            jobs.values().forEach(j -> j.cancelled = true);
        }
        runner.shutdownNow();
    }

    /** A job's state; written by its search thread and read under the lock of {@code jobs}. */
    private final class Job {
        final String id;
        final SizingRequest request;
        final long candidates;
        volatile boolean cancelled;
        volatile SizingProgress.Stage stage = SizingProgress.Stage.LAYOUTS;
        volatile long done;
        volatile long total;
        volatile RuntimeException failure;
        final java.util.concurrent.CountDownLatch finished = new java.util.concurrent.CountDownLatch(1);
        final Instant started = clock.instant();
        SizingJob.Status status = SizingJob.Status.RUNNING;
        SizingResult result;
        String message;
        Instant finishedAt;

        Job(String id, SizingRequest request, long candidates) {
            this.id = id;
            this.request = request;
            this.candidates = candidates;
        }

        /** True when the search ended within {@code wait}. */
        boolean await(Duration wait) {
            try {
                return finished.await(wait.toMillis(), java.util.concurrent.TimeUnit.MILLISECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return false;
            }
        }

        void progress(SizingProgress.Stage s, long d, long t) {
            stage = s;
            done = d;
            total = t;
        }

        void finish(SizingJob.Status s, SizingResult r, String m, Instant at) {
            status = s;
            result = r;
            message = m;
            finishedAt = at;
        }

        SizingJob view() {
            boolean over = status != SizingJob.Status.RUNNING;
            double fraction = status == SizingJob.Status.DONE ? 1.0 : fraction();
            Optional<Long> expires = over ? Optional.of(Math.max(0, Duration.between(clock.instant(),
                    finishedAt.plus(settings.keepFinished())).toSeconds())) : Optional.empty();
            long elapsedMs = Duration.between(started, over ? finishedAt : clock.instant()).toMillis();
            return new SizingJob(id, status, over ? Optional.empty() : Optional.of(stage.name()), done, total,
                    fraction, candidates, elapsedMs, Optional.ofNullable(result), Optional.ofNullable(message),
                    expires);
        }

        private double fraction() {
            int i = stage.ordinal();
            double within = total > 0 ? Math.min(1.0, (double) done / total) : 0.0;
            return STAGE_START[i] + within * (STAGE_START[i + 1] - STAGE_START[i]);
        }
    }
}
