package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
import io.restassured.specification.RequestSpecification;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class WindingPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html get(RequestSpecification query, int status) {
        return Html.of(query.get("/winding").then().statusCode(status).extract().response());
    }

    private static Html layout(int slots, int poles, String layers) {
        return get(given().queryParam("slots", slots).queryParam("poles", poles).queryParam("layers", layers), 200);
    }

    /** The cells of one row of the winding-factor table (harmonic orders across), without its heading. */
    private static List<String> factorRow(Html page, String heading) {
        return page.all("table.factors tbody tr").stream().filter(r -> r.selectFirst("th").text().equals(heading))
                .map(r -> r.select("td").eachText()).findFirst().orElseThrow();
    }

    private static String fact(Html page, String key) {
        return page.all("[data-fact=" + key + "] .fact-value").text();
    }

    /** The coil list as rows of cells: coil, start slot, return slot, phase, connection. */
    private static List<List<String>> coilList(Html page) {
        return page.all("table.coils tbody tr").stream().map(r -> r.select("td").eachText()).toList();
    }

    @Test
    void lays_out_twelve_slots_ten_poles_with_its_published_winding_factor() {
        // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010, table of kw1: 12 slots / 10 poles, double layer 0.933
        Html page = layout(12, 10, "DOUBLE");
        assertEquals("0.9330", factorRow(page, "Winding factor (distribution × pitch)").get(0));
        assertEquals("0.9330", fact(page, "fundamental"));
        assertEquals("60", fact(page, "cogging"), "LCM(12, 10)");
        assertEquals("2/5", fact(page, "q"));
        assertEquals("balanced, 2-fold", fact(page, "pull"), "gcd(12, 10) = 2");
        assertEquals(List.of("1", "3", "5", "7", "9", "11", "13"), page.all("table.factors thead th").eachText().subList(1, 8));
    }

    @Test
    void a_single_layer_winding_has_half_as_many_coils() {
        // source: El-Refaie 2010: 12 slots / 10 poles single layer kw1 = 0.966
        Html page = layout(12, 10, "SINGLE");
        assertEquals("0.9659", factorRow(page, "Winding factor (distribution × pitch)").get(0));
        assertEquals(6, coilList(page).size());
    }

    @Test
    void headline_figures_are_named_in_words_with_the_symbols_only_in_the_notes() {
        Html page = layout(9, 8, "DOUBLE");
        List<String> labels = page.all(".winding-fact dt").eachText();
        assertTrue(labels.containsAll(List.of("Slots per pole per phase", "Repeating sections around the stator",
                "Cogging cycles per revolution")), labels.toString());
        assertTrue(labels.stream().noneMatch(l -> l.matches(".*(gcd|LCM|\\bt =|\\bq\\b|kw).*")), labels.toString());
        assertTrue(page.all("[data-fact=sections] .fact-note").text().contains("t = gcd(Q, p)"));
        assertEquals("one-sided", fact(page, "pull"), "9 slots / 8 poles: gcd(9, 8) = 1");
    }

    @Test
    void the_unrolled_drawing_comes_first_and_the_factor_numbers_sit_behind_a_disclosure() {
        Html page = layout(12, 10, "DOUBLE");
        Element section = page.all("section.winding").first();
        Element firstFigure = section.selectFirst("figure");
        assertTrue(firstFigure.hasClass("unrolled"), firstFigure.className());
        assertTrue(isBefore(section.selectFirst(".unrolled"), section.selectFirst(".winding-facts")));
        assertTrue(isBefore(section.selectFirst(".unrolled"), section.selectFirst(".ring-view")));
        Element numbers = page.all("table.factors").first();
        assertEquals("details", numbers.closest("details").tagName());
        assertEquals(1, page.all(".factor-chart svg").size(), "the factors are drawn as bars");
        assertTrue(page.all("[style]").stream().allMatch(e -> e.closest(".chart") != null),
                "no inline style attributes outside the library-drawn chart");
    }

    @ParameterizedTest(name = "{0} slots, {1} poles, {2}")
    @CsvSource({"12, 10, DOUBLE", "9, 8, DOUBLE", "36, 4, DOUBLE", "24, 22, DOUBLE", "12, 10, SINGLE", "12, 8, DOUBLE",
            "24, 20, DOUBLE", "24, 4, SINGLE"})
    void the_unrolled_drawing_matches_the_coil_list(int slots, int poles, String layers) {
        Html page = layout(slots, poles, layers);
        List<List<String>> coils = coilList(page);
        boolean two = layers.equals("DOUBLE");
        assertEquals(two ? slots : slots / 2, coils.size());
        Elements drawings = page.all("figure.unrolled");
        assertEquals(slots <= 8 ? 1 : 2, drawings.size(), "one drawing for every screen, or a wide and a narrow one");
        for (Element drawing : drawings) {
            String variant = drawing.attr("data-variant");
            assertEquals(2 * coils.size(), drawing.select("g.side").size(), variant);
            for (List<String> c : coils) {
                boolean forward = c.get(4).equals("forward");
                Element start = one(drawing, "g.side[data-coil=" + c.get(0) + "][data-slot=" + c.get(1) + "][data-position=0]");
                Element back = one(drawing, "g.side[data-coil=" + c.get(0) + "][data-slot=" + c.get(2)
                        + "][data-position=" + (two ? 1 : 0) + "]");
                assertEquals(c.get(3), start.attr("data-phase"));
                assertEquals(c.get(3), back.attr("data-phase"));
                assertEquals(c.get(3), start.selectFirst("text").text(), "the phase letter is written in the side");
                assertEquals(forward ? "up" : "down", start.attr("data-direction"), "coil " + c);
                assertEquals(forward ? "down" : "up", back.attr("data-direction"), "coil " + c);
                Elements loops = drawing.select("g.loop[data-coil=" + c.get(0) + "]");
                assertFalse(loops.isEmpty(), "coil " + c.get(0) + " has its end connection drawn");
                for (Element loop : loops) {
                    assertEquals(c.get(1), loop.attr("data-go"));
                    assertEquals(c.get(2), loop.attr("data-return"));
                    assertEquals(!forward, Boolean.parseBoolean(loop.attr("data-reversed")));
                }
            }
            for (int s = 1; s <= slots; s++) {
                assertEquals(two ? 2 : 1, drawing.select("g.side[data-slot=" + s + "]").size(), "slot " + s);
            }
        }
    }

    @ParameterizedTest(name = "{0} slots, {1} poles, {2}")
    @CsvSource({"12, 10, DOUBLE", "9, 8, DOUBLE", "36, 4, DOUBLE", "24, 22, DOUBLE", "12, 10, SINGLE", "12, 8, DOUBLE",
            "24, 20, DOUBLE", "36, 8, DOUBLE", "18, 12, DOUBLE"})
    void the_repeating_sections_are_marked_gcd_of_slots_and_pole_pairs_times(int slots, int poles, String layers) {
        Html page = layout(slots, poles, layers);
        // source: Bianchi and Dai Pre, IEE Proc. Electr. Power Appl. 153(3), 2006: the star of slots, and with it a
        // double-layer winding, repeats t = gcd(Q, p) times round the machine
        int t = BigInteger.valueOf(slots).gcd(BigInteger.valueOf(poles / 2)).intValue();
        int length = slots / t;
        assertEquals(Integer.toString(t), fact(page, "sections"));
        for (Element drawing : page.all("figure.unrolled")) {
            assertEquals(Integer.toString(t), drawing.attr("data-sections"));
            for (int k = 1; k <= t; k++) {
                Elements bands = drawing.select("g.section[data-section=" + k + "]");
                int first = bands.stream().mapToInt(b -> Integer.parseInt(b.attr("data-first"))).min().orElseThrow();
                int last = bands.stream().mapToInt(b -> Integer.parseInt(b.attr("data-last"))).max().orElseThrow();
                assertEquals((k - 1) * length + 1, first, "section " + k);
                assertEquals(k * length, last, "section " + k);
                assertEquals(pattern(drawing, 1, length), pattern(drawing, first, last), "section " + k + " repeats section 1");
            }
            assertTrue(drawing.select("g.section[data-section=" + (t + 1) + "]").isEmpty());
            int rowStarts = (int) drawing.select("g.slot-row").stream()
                    .filter(r -> (Integer.parseInt(r.attr("data-first")) - 1) % length == 0).count();
            assertEquals(t - rowStarts, drawing.select("line.section-boundary").size(),
                    "a dashed line where a section starts inside a row");
        }
    }

    /** Phase, direction and position of every side in slots first..last, slot by slot. */
    private static List<String> pattern(Element drawing, int first, int last) {
        List<String> out = new ArrayList<>();
        for (int s = first; s <= last; s++) {
            out.add(drawing.select("g.side[data-slot=" + s + "]").stream()
                    .map(e -> e.attr("data-position") + e.attr("data-phase") + e.attr("data-direction"))
                    .sorted().collect(Collectors.joining(",")));
        }
        return out;
    }

    private static Element one(Element root, String css) {
        Elements found = root.select(css);
        assertEquals(1, found.size(), css);
        return found.first();
    }

    private static boolean isBefore(Element a, Element b) {
        List<Element> all = a.ownerDocument().getAllElements();
        return all.indexOf(a) < all.indexOf(b);
    }

    @Test
    void an_unbalanced_combination_is_a_422_with_the_reason_beside_slots() {
        Html page = get(given().queryParam("slots", 12).queryParam("poles", 12), 422);
        assertTrue(page.error("slots").startsWith("12 slots with 12 poles"), page.error("slots"));
        assertTrue(page.all(".unrolled").isEmpty());
        assertEquals("12", page.value("poles"));
    }

    @Test
    void invalid_numbers_are_a_400_with_messages_under_the_short_field_names() {
        Html page = get(given().queryParam("slots", "abc").queryParam("pitch", "-1"), 400);
        assertEquals("slots = \"abc\": must be a whole number", page.error("slots"));
        assertEquals("abc", page.value("slots"));
        Html pitch = get(given().queryParam("slots", 12).queryParam("poles", 10).queryParam("pitch", 9), 400);
        assertTrue(pitch.error("pitch").startsWith("coilPitchSlots = 9"), pitch.error("pitch"));
        assertFalse(pitch.has("slots-error"));
    }
}
