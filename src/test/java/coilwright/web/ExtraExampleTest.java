package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.service.ExampleCatalogue;
import coilwright.service.ExampleCatalogueTest;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** A file added to {@code examples/} appears on every page and route that offers the examples. */
class ExtraExampleTest {
    static final String SLUG = "zz-added-example";
    static final String TITLE = "An example added beside the shipped ones";

    @RegisterExtension
    static final TestApp APP = new TestApp().withExamples(catalogue());

    private static ExampleCatalogue catalogue() {
        try {
            return ExampleCatalogue.read(ExampleCatalogueTest.withExtraExample(Files.createTempDirectory("coilwright-examples-"),
                    SLUG, TITLE), Json.mapper());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html page(String path) {
        return Html.of(given().get(path).then().statusCode(200).extract().response());
    }

    @Test
    void the_home_page_offers_it() {
        assertEquals(TITLE, page("/").id("example-" + SLUG).selectFirst("h3").text());
    }

    @Test
    void the_design_pages_open_it() {
        assertEquals(TITLE, page("/design/results?example=" + SLUG).doc().selectFirst("h1").text());
        assertEquals("AXIAL_DUAL", page("/design/new?example=" + SLUG).selected("topology"));
    }

    @Test
    void both_match_pages_offer_it_and_match_it() {
        for (String path : List.of("/match/wind", "/match/hydro")) {
            assertTrue(page(path).all(".example-link").eachAttr("href").contains(path + "?example=" + SLUG), path);
        }
        Html form = page("/match/wind?example=" + SLUG);
        assertEquals(TITLE, form.doc().selectFirst(".lead strong").text());
        Map<String, String> fields = new java.util.HashMap<>();
        form.all("form[action=/match/wind] input[name], form[action=/match/wind] select[name]")
                .forEach(e -> fields.put(e.attr("name"), e.tagName().equals("select")
                        ? e.selectFirst("option[selected]") == null ? "" : e.selectFirst("option[selected]").val() : e.val()));
        Html result = Html.of(given().formParams(fields).post("/match/wind").then().statusCode(200).extract().response());
        assertTrue(result.has("results"));
        assertTrue(result.doc().selectFirst(".lead strong").text().equals(TITLE));
    }

    @Test
    void the_api_lists_and_serves_it() {
        List<String> slugs = given().get("/api/v1/examples").then().statusCode(200).extract().path("slug");
        assertEquals(List.of("axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v", SLUG), slugs);
        given().get("/api/v1/examples/" + SLUG).then().statusCode(200)
                .body("title", org.hamcrest.Matchers.equalTo(TITLE));
    }

    @Test
    void it_is_loaded_as_a_demo_design() throws InterruptedException {
        long deadline = System.nanoTime() + 120_000_000_000L;
        List<String> demos = List.of();
        while (System.nanoTime() < deadline && !demos.contains(SLUG)) {
            demos = given().get("/api/v1/demos").then().statusCode(200).extract().path("slug");
            if (!demos.contains(SLUG)) {
                Thread.sleep(250);
            }
        }
        assertTrue(demos.contains(SLUG), demos.toString());
    }
}
