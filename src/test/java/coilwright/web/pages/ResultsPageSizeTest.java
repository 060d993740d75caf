package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.service.ExampleCatalogue;
import coilwright.web.Html;
import coilwright.web.TestApp;
import io.restassured.response.Response;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.zip.GZIPOutputStream;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Every example's results page stays under 80 kB of HTML (it was about 420 kB when each chart segment and both
 * winding drawings were written into it) and still shows everything: the charts inline with their curves, the winding
 * drawings as images that the drawing address answers.
 */
class ResultsPageSizeTest {
    private static final int MAX_HTML_BYTES = 80 * 1024;

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static List<ExampleCatalogue.Example> examples() {
        return APP.app().services().examples().all();
    }

    private static int gzipped(byte[] bytes) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(out)) {
            gz.write(bytes);
        }
        return out.size();
    }

    @Test
    void each_example_results_page_is_at_most_80_kB_with_its_charts_inline() throws IOException {
        assertFalse(examples().isEmpty());
        for (ExampleCatalogue.Example ex : examples()) {
            Response r = given().get("/design/results?example=" + ex.slug()).then().statusCode(200).extract().response();
            byte[] html = r.asByteArray();
            System.out.printf("results page %s: %d bytes, %d gzipped%n", ex.slug(), html.length, gzipped(html));
            assertTrue(html.length <= MAX_HTML_BYTES, ex.slug() + ": " + html.length + " bytes");
            Html page = Html.of(new String(html, StandardCharsets.UTF_8));
            assertEquals(3, page.all(".charts .chart svg").size(), ex.slug());
            for (Element chart : page.all(".charts .chart svg")) {
                assertFalse(chart.select("path[d~=^M[^Z]*L.*L]").isEmpty(), ex.slug() + ": a chart keeps its curves");
                assertTrue(chart.select("line").size() < 200, ex.slug() + ": curves are paths, not a line per segment");
            }
        }
    }

    @Test
    void the_winding_drawings_of_a_results_page_are_images_that_their_address_answers() {
        ExampleCatalogue.Example ex = examples().get(0);
        Html page = Html.of(given().get("/design/results?example=" + ex.slug()).then().statusCode(200).extract().response());
        List<Element> images = page.all("section.winding figure img");
        assertTrue(images.size() >= 2, "the unrolled drawing(s) and the ring: " + images);
        int coils = page.all("table.coils tbody tr").size();
        for (Element img : images) {
            assertFalse(img.attr("alt").isBlank(), "each drawing is described");
            Response svg = given().urlEncodingEnabled(false).get(img.attr("src")).then().statusCode(200)
                    .contentType("image/svg+xml; charset=utf-8").extract().response();
            Html drawing = Html.of(svg.asString());
            assertEquals(1, drawing.all("svg").size(), img.attr("src"));
            boolean ring = img.attr("src").endsWith("view=ring");
            long drawn = drawing.all(ring ? "path.ring-coil" : "g.loop").stream().map(e -> e.attr("data-coil"))
                    .distinct().count();
            assertEquals(coils, drawn, img.attr("src") + ": every coil is drawn");
        }
    }

    @Test
    void a_drawing_of_an_unknown_view_is_refused_naming_the_field() {
        String body = given().get("/winding/drawing.svg?slots=12&poles=10&view=side").then().statusCode(400)
                .extract().asString();
        assertTrue(body.contains("view"), body);
    }
}
