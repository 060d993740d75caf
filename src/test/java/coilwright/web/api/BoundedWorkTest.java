package coilwright.web.api;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.TestApp;
import io.restassured.response.Response;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** Caps on the work one request may ask for, and the limit on expensive requests in flight. */
class BoundedWorkTest {
    private static final String AXIAL = "axial-wind-48v";

    @RegisterExtension
    static final TestApp APP = new TestApp().withConfig(c -> c.withBusyLimit(1, 0));

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void a_speed_range_beyond_its_cap_is_a_400_naming_the_cap() {
        String body = Bodies.exampleDesign(AXIAL).set("speedRange.points", 5000).json();
        given().contentType("application/json").body(body).post("/api/v1/evaluate").then().statusCode(400)
                .body("errors[0].field", equalTo("speedRange.points"))
                .body("errors[0].message", containsString("1000"));
    }

    @Test
    void a_list_beyond_its_cap_is_a_400_naming_the_field_and_the_cap_without_echoing_it() {
        List<Double> many = new ArrayList<>();
        for (int i = 0; i < 5_000; i++) {
            many.add(i * 1e-3);
        }
        String cpTable = "{\"type\":\"TableCp\",\"tipSpeedRatios\":" + many + ",\"cps\":" + many + "}";
        Response cp = given().contentType("application/json").body("{\"rotor\":{\"curve\":" + cpTable + "}}")
                .post("/api/v1/match/wind");
        cp.then().statusCode(400).contentType(startsWith("application/problem+json"));
        assertTrue(cp.asString().contains("rotor.curve.tipSpeedRatios has 5000 items: at most 200"), cp.asString());
        assertTrue(cp.asString().length() < 8000, "the answer does not echo the list: " + cp.asString().length());
    }

    @Test
    void beyond_the_limit_of_expensive_requests_the_answer_is_503_with_retry_after_while_health_stays_up()
            throws Exception {
        int clients = 8;
        ExecutorService pool = Executors.newFixedThreadPool(clients);
        CyclicBarrier start = new CyclicBarrier(clients);
        List<Future<Response>> answers = new ArrayList<>();
        for (int i = 0; i < clients; i++) {
            String body = Bodies.exampleDesign(AXIAL).set("speedRange.points", 1000)
                    .set("speedRange.maxRpm", 400.0 + i).json();
            answers.add(pool.submit(() -> {
                start.await(10, TimeUnit.SECONDS);
                return given().contentType("application/json").body(body).post("/api/v1/evaluate");
            }));
        }
        int ok = 0;
        int busy = 0;
        for (Future<Response> f : answers) {
            Response r = f.get(60, TimeUnit.SECONDS);
            if (r.statusCode() == 503) {
                busy++;
                assertEquals("1", r.header("Retry-After"));
                r.then().contentType(startsWith("application/problem+json")).body("type", equalTo("/problems/busy"));
            } else {
                assertEquals(200, r.statusCode(), r.asString());
                ok++;
            }
        }
        pool.shutdown();
        assertTrue(ok >= 1, "at least one ran");
        assertTrue(busy >= 1, "with one permit and no wait, some of " + clients + " at once are refused");
        given().get("/health").then().statusCode(200);
    }
}
