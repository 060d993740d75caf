package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.javalin.http.HandlerType;
import io.restassured.response.Response;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Every page of the route table, and the page each of its forms answers with its starting values, read as a person
 * reads it: no enum code name ({@code LEAD_ACID}) and no number with more than six significant digits anywhere in
 * the rendered text, the charts' text included, in SI and in imperial units.
 */
class PageWordsTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();
    private static final Pattern CODE_NAME = Pattern.compile("\\b[A-Z][A-Z0-9]*_[A-Z0-9_]+\\b");
    private static final Pattern SAVED_LINK = Pattern.compile("\\S*/[dr]/[A-Za-z0-9_-]+\\S*");
    private static final Pattern NUMBER = Pattern.compile("(?<![\\w.])\\d+(\\.\\d+)?(?![\\w])");
    private static final int MAX_DIGITS = 6;

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** The pages of the route table with values for their path parameters, and a few queries that change them. */
    private static List<String> pages() {
        String id = given().formParam("document", savedDocument()).post("/saved").then().statusCode(201).extract()
                .htmlPath().getString("**.find { it.@id == 'open-link' }.@href").replace("/d/", "");
        String rev = given().get("/api/v1/designs/" + id).then().statusCode(200).extract().path("latest.revisionId");
        List<String> pages = new ArrayList<>();
        for (Route r : APP.app().routes()) {
            if (r.method() != HandlerType.GET || Route.isApiPath(r.path()) || r.path().startsWith("/api/")) {
                continue;
            }
            String page = r.path().replace("{designId}", id).replace("{revisionId}", rev);
            pages.add(page.contains("{jobId}") ? page.replace("{jobId}", SecurityHeadersTest.sizingJobId()) : page);
        }
        for (String slug : APP.app().services().examples().slugs()) {
            pages.add("/design/results?example=" + slug);
            pages.add("/design/new?example=" + slug);
            pages.add("/design/bench?example=" + slug);
        }
        pages.add("/winding?slots=36&poles=4");
        pages.add("/compare?a=" + rev + "&b=" + id);
        pages.remove("/design/results");
        pages.remove("/design/bench");
        return pages;
    }

    private static String savedDocument() {
        return given().get("/api/v1/examples/axial-wind-48v").then().statusCode(200).extract().asString();
    }

    @Test
    void no_page_shows_a_code_name_or_an_unrounded_number() {
        List<String> problems = new ArrayList<>();
        int pagesRead = 0;
        for (String units : List.of("si", "imperial")) {
            for (String page : pages()) {
                Response r = given().urlEncodingEnabled(false).queryParam("units", units).get(page);
                assertEquals(200, r.statusCode(), page);
                Html html = Html.of(r);
                problems.addAll(scan(page + " (" + units + ")", html.doc()));
                pagesRead++;
                for (Element form : html.all("main form[method=post]")) {
                    if (form.attr("action").equals("/saved") && form.selectFirst("input[name=design]") == null) {
                        continue;
                    }
                    Response answer = given().queryParam("units", units).formParams(values(form)).post(form.attr("action"));
                    assertTrue(answer.statusCode() < 500, form.attr("action") + " from " + page + ": " + answer.statusCode());
                    problems.addAll(scan("POST " + form.attr("action") + " from " + page + " (" + units + ")",
                            Html.of(answer).doc()));
                    pagesRead++;
                }
            }
        }
        assertTrue(pagesRead > 40, "pages read: " + pagesRead);
        assertTrue(problems.isEmpty(), problems.size() + " problems:\n" + String.join("\n", problems.stream().distinct().limit(60).toList()));
    }

    @Test
    void a_saved_link_s_random_id_is_not_read_as_a_code_name_but_a_code_name_beside_it_is() {
        Document doc = org.jsoup.Jsoup.parse("<body><p>Link: http://127.0.0.1:7070/d/1FR75qhrDSBTNfh08Ng/r/"
                + "C6iOGmV6qDVrBUE2g-Q_7A battery LEAD_ACID, 1234567 W</p></body>");
        List<String> found = scan("sample", doc);
        assertEquals(2, found.size(), found.toString());
        assertTrue(found.get(0).contains("code name LEAD_ACID") && found.get(1).contains("number 1234567"), found.toString());
    }

    /** What a reader sees: the body's text and the text of the SVG charts, without the scripts. */
    static List<String> scan(String where, Document doc) {
        doc.select("script, style").remove();
        String text = String.join(" ", doc.body().select("*").stream()
                .flatMap(e -> e.textNodes().stream()).map(t -> t.text().strip()).filter(t -> !t.isEmpty()).toList());
        // a saved design's link shows its random ids (base64url: "Q_7A" or "-1234567" in one of them is chance, not
        // a code name or a long number)
        text = SAVED_LINK.matcher(text).replaceAll("(link)");
        List<String> found = new ArrayList<>();
        Matcher code = CODE_NAME.matcher(text);
        while (code.find()) {
            found.add(where + ": code name " + code.group() + " in \"" + around(text, code.start()) + "\"");
        }
        Matcher n = NUMBER.matcher(text);
        while (n.find()) {
            String digits = n.group().replace(".", "").replaceFirst("^0+", "");
            if (digits.length() > MAX_DIGITS) {
                found.add(where + ": number " + n.group() + " in \"" + around(text, n.start()) + "\"");
            }
        }
        return found;
    }

    private static String around(String text, int at) {
        return text.substring(Math.max(0, at - 40), Math.min(text.length(), at + 40));
    }

    /** A form's fields with the values it shows, as a browser would post them unchanged. */
    static Map<String, String> values(Element form) {
        Map<String, String> f = new LinkedHashMap<>();
        for (Element e : form.select("input[name], select[name], textarea[name]")) {
            if (e.attr("type").equals("file") || e.attr("type").equals("submit")) {
                continue;
            }
            if (e.tagName().equals("select")) {
                Element opt = e.selectFirst("option[selected]");
                f.put(e.attr("name"), opt == null ? e.selectFirst("option") == null ? "" : e.selectFirst("option").val() : opt.val());
            } else if (!e.attr("type").equals("checkbox") || e.hasAttr("checked")) {
                f.put(e.attr("name"), e.tagName().equals("textarea") ? e.text() : e.val());
            }
        }
        return f;
    }
}
