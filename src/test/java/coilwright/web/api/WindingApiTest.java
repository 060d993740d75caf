package coilwright.web.api;

import static coilwright.web.api.ProblemAssertions.assertInfeasible;
import static coilwright.web.api.ProblemAssertions.assertMalformed;
import static coilwright.web.api.ProblemAssertions.assertOneInvalidField;
import static coilwright.web.api.ProblemAssertions.post;
import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsInAnyOrder;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class WindingApiTest {
    private static final String PATH = "/api/v1/winding";
    private static final double KW_TOLERANCE = 1e-4;

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void lays_out_12_slots_10_poles_with_its_published_factor_and_numbers() {
        Response r = post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").json());
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(200).contentType(startsWith("application/json"))
                // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010, table of kw1 for tooth-coil windings
                .body("windingFactors[0].order", equalTo(1))
                .body("windingFactors[0].windingFactor", closeTo(0.9330, KW_TOLERANCE))
                .body("windingFactors.order", contains(1, 3, 5, 7, 9, 11, 13))
                .body("q", equalTo("2/5"))
                .body("periodicity", equalTo(1))
                .body("lcmSlotsPoles", equalTo(60))
                .body("gcdSlotsPoles", equalTo(2))
                .body("slotAngleElecDeg", closeTo(150.0, 1e-9))
                .body("coilPitchSlots", equalTo(1))
                .body("coils", hasSize(12))
                .body("coilsPerPhase", equalTo(4))
                .body("phaseCoils", hasSize(3))
                .body("phaseCoils[0]", contains(1, 2, 7, 8));
    }

    @Test
    void coils_of_12_slots_10_poles_follow_the_usual_A_minusA_minusB_B_pattern() {
        JsonPath json = post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").json()).then().statusCode(200).extract().jsonPath();
        List<Map<String, Object>> coils = json.getList("coils");
        List<String> labels = new ArrayList<>();
        for (Map<String, Object> c : coils) {
            int polarity = ((Number) c.get("polarity")).intValue();
            labels.add((polarity < 0 ? "-" : "") + "ABC".charAt(((Number) c.get("phase")).intValue()));
            assertEquals(((Number) c.get("goSlot")).intValue() % 12 + 1, ((Number) c.get("returnSlot")).intValue(),
                    "a tooth coil returns in the next slot");
        }
        // from memory: the standard double-layer 12-slot 10-pole layout of tooth-coil machine texts
        assertEquals(List.of("A", "-A", "-B", "B", "C", "-C", "-A", "A", "B", "-B", "-C", "C"), labels);
    }

    @ParameterizedTest(name = "{0} slots, {1} poles, {2}: kw1 = {3}")
    @CsvSource({
            // source: El-Refaie 2010 (IEEE Trans. Ind. Electron. 57(1)) tables, as quoted in DESIGN.md section 6
            "9, 8, DOUBLE, 0.9452",
            "9, 10, DOUBLE, 0.9452",
            "12, 14, DOUBLE, 0.9330",
            "12, 8, DOUBLE, 0.8660",
            "24, 22, DOUBLE, 0.9495",
            "21, 20, DOUBLE, 0.9531",
            "12, 10, SINGLE, 0.9659",
            // distributed q = 2, full pitch: kd = sin(30)/(2 sin(15)) = 0.9659 (textbook distribution factor)
            "24, 4, DOUBLE, 0.9659",
            // distributed q = 3, full pitch: kd = sin(30)/(3 sin(10)) = 0.9598
            "36, 4, DOUBLE, 0.9598"})
    void fundamental_winding_factor_matches_the_published_tables(int slots, int poles, String layers, double kw1) {
        post(PATH, Bodies.winding(slots, poles, 3, layers).json()).then().statusCode(200)
                .body("windingFactors[0].windingFactor", closeTo(kw1, KW_TOLERANCE));
    }

    @Test
    void single_phase_windings_are_laid_out_too() {
        Response r = post(PATH, Bodies.winding(8, 8, 1, "DOUBLE").json());
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(200).body("phaseCoils", hasSize(1)).body("coils", hasSize(8))
                .body("windingFactors[0].windingFactor", closeTo(1.0, 1e-12));
    }

    @Test
    void skew_reduces_the_total_factor_by_the_skew_factor() {
        // skew of one slot pitch, 150 electrical degrees: ks1 = sin(75 deg)/(75 deg in rad) = 0.7379
        post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("skewSlotPitches", 1.0).json()).then().statusCode(200)
                .body("windingFactors[0].skewFactor", closeTo(Math.sin(Math.toRadians(75)) / Math.toRadians(75), 1e-9))
                .body("windingFactors[0].totalFactor", closeTo(0.9330 * 0.7379, 2e-4));
    }

    @Test
    void parallel_paths_split_the_phase_coils() {
        post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("parallelPaths", 2).json()).then().statusCode(200)
                .body("coilsPerPathPerPhase", equalTo(2))
                .body("parallelPathCoils[0]", hasSize(2));
    }

    @Test
    void an_unbalanced_combination_is_a_422_naming_slots() {
        assertInfeasible(post(PATH, Bodies.winding(12, 12, 3, "DOUBLE").json()), PATH, "slots")
                .body("detail", containsString("cannot be balanced"))
                .body("detail", startsWith("12 slots with 12 poles and 3 phases"));
    }

    @ParameterizedTest(name = "{0} slots, {1} poles")
    @CsvSource({"6, 6", "10, 8"})
    void other_published_infeasible_combinations_are_422(int slots, int poles) {
        assertInfeasible(post(PATH, Bodies.winding(slots, poles, 3, "DOUBLE").json()), PATH, "slots");
    }

    @Test
    void parallel_paths_that_do_not_divide_the_coils_are_a_400_listing_what_is_allowed() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("parallelPaths", 3).json()), PATH,
                "parallelPaths", "3",
                "parallelPaths = 3: the 4 coils of each phase cannot be split into 3 identical groups; allowed: 1, 2",
                "1, 2");
    }

    @Test
    void a_missing_field_is_named() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").remove("parallelPaths").json()), PATH,
                "parallelPaths", "missing", "parallelPaths is missing: a value is required", "a whole number");
    }

    @Test
    void a_string_for_a_number_is_refused() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("poles", "ten").json()), PATH,
                "poles", "ten", "poles = \"ten\": must be a whole number", "a whole number");
    }

    @Test
    void a_negative_slot_count_is_refused_with_its_range() {
        assertOneInvalidField(post(PATH, Bodies.winding(-12, 10, 3, "DOUBLE").json()), PATH,
                "slots", "-12", "slots = -12: must be between 2 and 400", "2 to 400");
    }

    @Test
    void odd_poles_are_refused() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 11, 3, "DOUBLE").json()), PATH, "poles", "11",
                "poles = 11: must be even (north and south poles come in pairs)", "even, 2 to 400");
    }

    @Test
    void NaN_as_a_string_is_refused() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("skewSlotPitches", "NaN").json()), PATH,
                "skewSlotPitches", "NaN", "skewSlotPitches = \"NaN\": must be a finite number", "a finite number");
    }

    @Test
    void NaN_as_a_bare_token_is_malformed_json() {
        assertMalformed(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").raw("skewSlotPitches", "NaN").json()), PATH,
                "Malformed JSON at line 1, column");
    }

    @Test
    void a_billion_slots_is_out_of_range() {
        assertOneInvalidField(post(PATH, Bodies.winding(1_000_000_000, 10, 3, "DOUBLE").json()), PATH,
                "slots", "1000000000", "slots = 1000000000: must be between 2 and 400", "2 to 400");
    }

    @Test
    void a_slot_count_written_as_1e9_is_not_a_whole_number() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").raw("slots", "1e9").json()), PATH,
                "slots", "1.0E9", "slots = 1.0E9: must be a whole number", "a whole number");
    }

    @Test
    void a_huge_skew_is_out_of_range() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("skewSlotPitches", 1e308).json()), PATH,
                "skewSlotPitches", "1.0E308", "skewSlotPitches = 1.0E308: must be between 0.0 and 2.0", "0.0 to 2.0");
    }

    @Test
    void an_unknown_layer_kind_lists_the_allowed_ones() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "TRIPLE").json()), PATH,
                "layers", "TRIPLE", "layers = \"TRIPLE\": must be one of SINGLE, DOUBLE", "one of SINGLE, DOUBLE");
    }

    @Test
    void an_unknown_field_is_refused_with_the_known_ones() {
        assertOneInvalidField(post(PATH, Bodies.winding(12, 10, 3, "DOUBLE").set("teeth", 12).json()), PATH,
                "teeth", "12", "teeth: unknown field",
                "known fields: slots, poles, phases, layers, coilPitchSlots, parallelPaths, skewSlotPitches");
    }

    @Test
    void every_type_error_is_listed_at_once() {
        // range checks of a record run once its leaves have the right types (see the next test)
        String body = Bodies.winding(-1, 11, 2, "TRIPLE").set("skewSlotPitches", "NaN").set("extra", true).json();
        Response r = post(PATH, body);
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(400).body("detail", equalTo("3 fields are invalid."))
                .body("errors.field", containsInAnyOrder("extra", "layers", "skewSlotPitches"));
    }

    @Test
    void range_errors_of_the_record_are_all_listed_when_the_types_are_right() {
        Response r = post(PATH, Bodies.winding(1, 11, 2, "DOUBLE").set("skewSlotPitches", 3.0).json());
        r.then().statusCode(400).body("errors.field", containsInAnyOrder("slots", "poles", "phases", "skewSlotPitches"));
    }

    @Test
    void an_empty_body_is_malformed() {
        assertMalformed(post(PATH, ""), PATH, "The request body is empty: a JSON object is required.");
    }

    @Test
    void broken_json_is_malformed_with_its_position() {
        assertMalformed(post(PATH, "{\"slots\": 12,\n \"poles\": }"), PATH, "Malformed JSON at line 2, column");
    }

    @Test
    void a_body_over_the_limit_is_a_413() {
        ProblemAssertions.assertTooLarge(PATH);
    }

    @Test
    void GET_is_not_allowed() {
        given().get(PATH).then().statusCode(405).contentType(startsWith("application/problem+json"))
                .body("detail", equalTo("GET is not allowed on " + PATH + "."));
    }
}
