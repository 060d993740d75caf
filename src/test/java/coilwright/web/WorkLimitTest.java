package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.javalin.http.Handler;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

class WorkLimitTest {
    @Test
    void beyond_the_limit_a_request_is_refused_503_with_retry_after_and_admitted_again_once_one_ends() throws Exception {
        WorkLimit limit = new WorkLimit(1, 0);
        CountDownLatch entered = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        Handler holding = limit.guard(ctx -> {
            entered.countDown();
            release.await(10, TimeUnit.SECONDS);
        });
        Thread first = new Thread(() -> {
            try {
                holding.handle(null);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        first.start();
        assertTrue(entered.await(10, TimeUnit.SECONDS));
        assertEquals(1, limit.inFlight());
        RefusedRequestException refused = assertThrows(RefusedRequestException.class, () -> limit.guard(ctx -> { }).handle(null));
        assertEquals(503, refused.status());
        assertEquals(1, refused.retryAfterSeconds());
        release.countDown();
        first.join(10_000);
        boolean[] ran = {false};
        limit.guard(ctx -> ran[0] = true).handle(null);
        assertTrue(ran[0]);
        assertEquals(0, limit.inFlight());
    }

    @Test
    void a_request_waits_for_its_turn_within_the_wait() throws Exception {
        WorkLimit limit = new WorkLimit(1, 5_000);
        CountDownLatch entered = new CountDownLatch(1);
        Thread first = new Thread(() -> {
            try {
                limit.guard(ctx -> {
                    entered.countDown();
                    Thread.sleep(200);
                }).handle(null);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        first.start();
        assertTrue(entered.await(10, TimeUnit.SECONDS));
        boolean[] ran = {false};
        limit.guard(ctx -> ran[0] = true).handle(null);
        assertTrue(ran[0], "the second request waited and ran");
        first.join(10_000);
    }

    @Test
    void an_admitted_request_runs_under_the_time_budget_and_the_budget_ends_with_it() throws Exception {
        WorkLimit limit = new WorkLimit(1, 0, 1);
        coilwright.validation.SolverFailedException e = assertThrows(coilwright.validation.SolverFailedException.class,
                () -> limit.guard(ctx -> {
                    Thread.sleep(5);
                    coilwright.validation.TimeBudget.check("speedRange.points");
                }).handle(null));
        assertEquals("speedRange.points", e.field());
        coilwright.validation.TimeBudget.check("x"); // closed: no budget on this thread any more
        assertEquals(0, limit.inFlight());
    }

    @Test
    void a_failing_handler_gives_its_permit_back() {
        WorkLimit limit = new WorkLimit(1, 0);
        assertThrows(IllegalStateException.class, () -> limit.guard(ctx -> {
            throw new IllegalStateException("boom");
        }).handle(null));
        assertEquals(0, limit.inFlight());
    }
}
