package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** HTML, JSON, SVG and CSV answers are gzip-compressed for a client that accepts it, and plain for one that does not. */
class CompressionTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    private static final HttpClient CLIENT = HttpClient.newHttpClient();

    @Test
    void html_json_svg_and_csv_are_gzipped_when_accepted() throws Exception {
        String page = gunzip(get("/design/results?example=axial-wind-48v", true), "text/html");
        assertTrue(page.contains("<svg"), "the results page with its charts");
        assertTrue(gunzip(get("/api/v1/openapi.json", true), "application/json").contains("\"openapi\""));
        assertTrue(gunzip(get("/static/img/axial-coil-dimensions.svg", true), "image/svg+xml").contains("<svg"));
        String csv = gunzip(get(demoCurvesCsv(), true), "text/csv");
        assertTrue(csv.lines().count() > 10, "a CSV with its rows");
    }

    @Test
    void a_client_that_does_not_accept_gzip_gets_plain_bytes() throws Exception {
        HttpResponse<byte[]> r = get("/design/results?example=axial-wind-48v", false);
        assertEquals(200, r.statusCode());
        assertTrue(r.headers().firstValue("Content-Encoding").isEmpty());
        assertTrue(new String(r.body(), StandardCharsets.UTF_8).contains("<svg"));
    }

    private static String gunzip(HttpResponse<byte[]> r, String type) throws IOException {
        assertEquals(200, r.statusCode(), r.uri().toString());
        assertTrue(r.headers().firstValue("Content-Type").orElse("").startsWith(type), r.uri() + " " + r.headers());
        assertEquals("gzip", r.headers().firstValue("Content-Encoding").orElse(""), r.uri().toString());
        try (GZIPInputStream in = new GZIPInputStream(new ByteArrayInputStream(r.body()))) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static HttpResponse<byte[]> get(String path, boolean gzip) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(APP.url(path)));
        if (gzip) {
            b.header("Accept-Encoding", "gzip");
        }
        return CLIENT.send(b.build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    private static String demoCurvesCsv() throws Exception {
        long until = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < until) {
            var demos = Json.mapper().readTree(get("/api/v1/demos", false).body());
            if (demos.size() > 0) {
                return "/api/v1/designs/" + demos.get(0).get("designId").asText() + "/curves.csv";
            }
            Thread.sleep(100);
        }
        throw new AssertionError("no demo design after 60 s");
    }
}
