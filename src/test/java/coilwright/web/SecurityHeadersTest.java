package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Every page of the route table (path ids filled from a demo design) is parsed: no inline script, no event-handler
 * attribute, no {@code style} element or attribute, no {@code javascript:} link; and every response carries the
 * security headers, so the Content-Security-Policy can forbid inline code.
 */
class SecurityHeadersTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void every_page_has_no_inline_script_or_style_and_carries_the_security_headers() {
        Map<String, String> ids = demoIds();
        List<String> checked = new ArrayList<>();
        for (Route route : APP.app().routes()) {
            if (route.method() != io.javalin.http.HandlerType.GET || Route.isApiPath(route.path())) {
                continue;
            }
            String path = route.path().replace("{designId}", ids.get("designId"))
                    .replace("{revisionId}", ids.get("revisionId"));
            if (path.contains("{jobId}")) {
                path = path.replace("{jobId}", sizingJobId());
            }
            if (path.equals("/design/results") || path.equals("/design/bench")) {
                path += "?example=" + ids.get("slug");
            }
            if (path.equals("/compare")) {
                path += "?a=" + ids.get("revisionId") + "&b=" + ids.get("revisionId");
            }
            Response r = given().get(path);
            assertEquals(200, r.statusCode(), path);
            assertHeaders(r, path);
            assertNoInlineCode(r.asString(), path);
            checked.add(path);
        }
        assertTrue(checked.size() >= 12, "pages checked: " + checked);
    }

    /** A small sizing search started as a job, for the job's progress page. */
    static String sizingJobId() {
        try (var in = SecurityHeadersTest.class.getClassLoader().getResourceAsStream("sizing/small-axial-wind-24v.json")) {
            String body = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
            return given().contentType("application/json").header("Prefer", "respond-async").body(body)
                    .post("/api/v1/sizing").then().statusCode(202).extract().path("id");
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void json_errors_static_files_and_token_pages_carry_the_headers_too() {
        assertHeaders(given().get("/api/v1/examples"), "/api/v1/examples");
        assertHeaders(given().get("/api/v1/nothing-here"), "/api/v1/nothing-here");
        assertHeaders(given().get("/nothing-here"), "/nothing-here");
        assertHeaders(given().get("/static/css/coilwright.css"), "/static/css/coilwright.css");
        Response created = given().contentType("application/json").body(demoDocument()).post("/api/v1/designs");
        created.then().statusCode(201);
        assertHeaders(created, "POST /api/v1/designs");
        assertEquals("no-store", created.header("Cache-Control"));
        assertEquals("no-referrer", created.header("Referrer-Policy"));
    }

    @Test
    void the_policy_forbids_inline_code_framing_plugins_and_base() {
        String csp = SecurityHeaders.CONTENT_SECURITY_POLICY;
        assertTrue(csp.contains("default-src 'self'"));
        assertTrue(csp.contains("frame-ancestors 'none'"));
        assertTrue(csp.contains("object-src 'none'"));
        assertTrue(csp.contains("base-uri 'none'"));
        assertTrue(csp.contains("form-action 'self'"));
        assertFalse(csp.contains("unsafe-inline"), csp);
        assertFalse(csp.contains("unsafe-eval"), csp);
    }

    static void assertHeaders(Response r, String what) {
        assertEquals(SecurityHeaders.CONTENT_SECURITY_POLICY, r.header("Content-Security-Policy"), what);
        assertEquals("nosniff", r.header("X-Content-Type-Options"), what);
        assertEquals("no-referrer", r.header("Referrer-Policy"), what);
    }

    /** Fails on any inline script, event handler, style element or attribute, or javascript: URL. */
    static void assertNoInlineCode(String html, String what) {
        var doc = Html.of(html).doc();
        for (Element script : doc.select("script")) {
            assertTrue(script.hasAttr("src") && script.data().isBlank(), what + ": inline script " + script);
        }
        assertTrue(doc.select("style").isEmpty(), what + ": a <style> element");
        assertTrue(doc.select("[style]").isEmpty(), what + ": style attribute on " + first(doc.select("[style]")));
        for (Element e : doc.getAllElements()) {
            e.attributes().forEach(a -> {
                assertFalse(a.getKey().toLowerCase(java.util.Locale.ROOT).startsWith("on"),
                        what + ": event handler " + a.getKey() + " on <" + e.tagName() + ">");
                assertFalse(a.getValue().strip().toLowerCase(java.util.Locale.ROOT).startsWith("javascript:"),
                        what + ": javascript: URL on <" + e.tagName() + ">");
            });
        }
    }

    private static String first(org.jsoup.select.Elements es) {
        return es.isEmpty() ? "" : es.get(0).outerHtml().substring(0, Math.min(200, es.get(0).outerHtml().length()));
    }

    private static Map<String, String> demoIds() {
        long until = System.nanoTime() + Duration.ofSeconds(60).toNanos();
        while (true) {
            List<Map<String, String>> demos = given().get("/api/v1/demos").jsonPath().getList("$");
            if (!demos.isEmpty()) {
                Map<String, String> d = demos.get(0);
                return Map.of("designId", d.get("designId"), "revisionId", d.get("latestRevisionId"), "slug", d.get("slug"));
            }
            if (System.nanoTime() > until) {
                throw new AssertionError("no demo design after 60 s");
            }
            try {
                Thread.sleep(100);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError(e);
            }
        }
    }

    private static String demoDocument() {
        return given().get("/api/v1/designs/" + demoIds().get("designId") + "/export").asString();
    }
}
