package coilwright.web.api;

import static coilwright.web.api.ProblemAssertions.assertInfeasible;
import static coilwright.web.api.ProblemAssertions.assertMalformed;
import static coilwright.web.api.ProblemAssertions.assertOneInvalidField;
import static coilwright.web.api.ProblemAssertions.post;
import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsInAnyOrder;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class EvaluateApiTest {
    private static final String PATH = "/api/v1/evaluate";
    private static final String AXIAL = "axial-wind-48v";

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** The axial example with resistors (no cable) in place of its battery. */
    private static Bodies resistiveAxial() {
        return Bodies.exampleDesign(AXIAL).set("load", Map.of("type", "ResistiveLoad", "resistancePerPhaseOhm", 2.0,
                "acCable", Map.of("lengthM", 0.0, "conductorAreaM2", 1e-6, "temperatureC", 20.0)));
    }

    private static double num(Map<String, Object> point, String field) {
        return ((Number) point.get(field)).doubleValue();
    }

    // ---- good input -------------------------------------------------------------------------------------------

    @ParameterizedTest
    @ValueSource(strings = {"axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v"})
    void each_example_evaluates_with_the_closed_form_and_solved_cut_in_within_half_a_percent(String slug) {
        Response r = post(PATH, Bodies.exampleDesign(slug).json());
        OpenApiContract.assertMatches(r, PATH, "POST");
        JsonPath json = r.then().statusCode(200).contentType(startsWith("application/json")).extract().jsonPath();
        double closedForm = json.getDouble("cutInSpeedRpm");
        double solved = json.getDouble("cutInSpeedSolvedRpm");
        assertTrue(closedForm > 0, "a battery load has a cut-in speed");
        assertEquals(closedForm, solved, 0.005 * closedForm, "closed-form vs solved cut-in");
    }

    @ParameterizedTest
    @ValueSource(strings = {"ratedSpeedRpm", "maxSpeedRpm"})
    void a_given_speed_so_small_its_angular_speed_underflows_is_refused_under_its_own_name(String field) {
        // found by the request fuzz test: 4.9e-324 rpm made the windage 0 x infinity and the answer a 500
        post(PATH, Bodies.exampleDesign(AXIAL).set(field, Double.MIN_VALUE).json())
                .then().statusCode(400).body("errors[0].field", org.hamcrest.Matchers.endsWith(field));
    }

    @Test
    void above_cut_in_the_battery_takes_more_power_as_speed_rises_and_nothing_below() {
        JsonPath json = post(PATH, Bodies.exampleDesign(AXIAL).json()).then().statusCode(200).extract().jsonPath();
        double cutIn = json.getDouble("cutInSpeedSolvedRpm");
        List<Map<String, Object>> points = json.getList("points");
        assertEquals(121, points.size());
        double previous = 0;
        int charging = 0;
        for (Map<String, Object> p : points) {
            if (num(p, "speedRpm") < cutIn) {
                assertEquals(0.0, num(p, "dcCurrentA"), 0.0, "no charge below cut-in at " + p.get("speedRpm"));
            } else if (num(p, "speedRpm") > cutIn) {
                assertTrue(num(p, "powerToLoadW") > previous, "power rises at " + p.get("speedRpm") + " rpm");
                previous = num(p, "powerToLoadW");
                charging++;
            }
        }
        assertTrue(charging > 10, "the range reaches well above cut-in: " + charging + " points");
        assertTrue(json.getDouble("rated.powerToLoadW") > 0, "rated output");
    }

    @Test
    void the_result_carries_the_solved_winding_temperature_and_a_balanced_loss_breakdown() {
        Response r = post(PATH, Bodies.exampleDesign("rewound-motor-12v").json());
        OpenApiContract.assertMatches(r, PATH, "POST");
        JsonPath json = r.then().statusCode(200).extract().jsonPath();
        Map<String, Object> rated = json.getMap("heatAndLosses.rated");
        assertTrue(num(rated, "windingMeanC") > json.getDouble("heatAndLosses.ambientC"), "a loaded winding is warm");
        double losses = 0;
        for (String f : List.of("windingCopperLossW", "conductorEddyLossW", "deltaCirculationLossW", "statorIronLossW",
                "bearingFrictionLossW", "windageLossW", "diodeLossW", "cableLossW", "batteryInternalLossW")) {
            losses += num(rated, f);
        }
        assertEquals(num(rated, "shaftPowerW"), num(rated, "powerToLoadW") + losses, 1e-6 * num(rated, "shaftPowerW"));
        assertTrue(num(rated, "deltaCirculationLossW") > 0, "the delta example counts its circulating current");
        assertTrue(json.getDouble("heatAndLosses.cogging.peakNm") > 0, "a slotted stator cogs");
        assertEquals(36, json.getInt("heatAndLosses.cogging.cyclesPerRevolution"), "LCM(36 slots, 12 poles)");
    }

    @Test
    void the_axial_example_warns_of_its_open_circuit_voltage_at_maximum_speed() {
        post(PATH, Bodies.exampleDesign(AXIAL).json()).then().statusCode(200)
                .body("cautions.code", hasItem("OPEN_CIRCUIT_VOLTAGE"))
                .body("maxSpeedRpm", equalTo(600.0));
    }

    @Test
    void a_resistive_load_takes_the_power_of_a_source_behind_its_R_and_L() {
        Response r = post(PATH, resistiveAxial().json());
        OpenApiContract.assertMatches(r, PATH, "POST");
        JsonPath json = r.then().statusCode(200).extract().jsonPath();
        double rHot = json.getDouble("alternator.resistance.resistanceHotOhm");
        double l = json.getDouble("alternator.inductance.phaseInductanceH");
        double kePh = json.getDouble("alternator.kePhaseRmsVPerRpm");
        int polePairs = json.getInt("alternator.spec.winding.poles") / 2;
        assertEquals(10, polePairs, "the axial example has 20 poles");
        // a delta winding behaves at its terminals as the equivalent star: E/sqrt(3), R/3, L/3
        boolean delta = "DELTA".equals(json.getString("alternator.spec.connection"));
        double k = delta ? 3 : 1;
        assertEquals(0.0, json.getDouble("cutInSpeedRpm"), 0.0, "resistors take current at any speed");
        for (Map<String, Object> p : json.<Map<String, Object>>getList("points")) {
            double n = num(p, "speedRpm");
            double x = 2 * Math.PI * polePairs * n / 60 * l / k;
            double e = kePh * n / Math.sqrt(k);
            // source: phasor analysis of an EMF behind R + jX feeding a resistor (any circuits text), 3 phases
            double expected = 3 * e * e * 2.0 / ((rHot / k + 2.0) * (rHot / k + 2.0) + x * x);
            assertEquals(expected, num(p, "powerToLoadW"), 1e-6 * Math.max(1, expected), "P at " + n + " rpm");
            assertEquals(polePairs * n / 60, num(p, "frequencyHz"), 1e-9, "f = p n / 60");
            double losses = num(p, "windingCopperLossW") + num(p, "cableLossW") + num(p, "batteryInternalLossW")
                    + num(p, "diodeLossW");
            assertEquals(num(p, "shaftPowerW"), num(p, "powerToLoadW") + losses, 1e-9 * Math.max(1, expected),
                    "energy balance at " + n + " rpm");
        }
    }

    @Test
    void every_number_in_the_result_is_finite() {
        String body = post(PATH, resistiveAxial().json()).then().statusCode(200).extract().asString();
        assertTrue(!body.contains("NaN") && !body.contains("Infinity"), "no non-finite numbers");
    }

    @Test
    void the_same_request_written_differently_gets_the_same_answer() {
        String compact = resistiveAxial().json();
        String spaced = compact.replace(",", ",\n  ").replace(":", " : ");
        String a = post(PATH, compact).then().statusCode(200).extract().asString();
        String b = post(PATH, spaced).then().statusCode(200).extract().asString();
        assertEquals(a, b);
    }

    @Test
    void a_repeated_body_gets_identical_bytes_and_a_repeated_error_stays_an_error() {
        String body = resistiveAxial().json();
        byte[] a = post(PATH, body).then().statusCode(200).extract().asByteArray();
        byte[] b = post(PATH, body).then().statusCode(200).extract().asByteArray();
        org.junit.jupiter.api.Assertions.assertArrayEquals(a, b);
        String bad = resistiveAxial().set("alternator.winding.poles", 12).json();
        post(PATH, bad).then().statusCode(422);
        post(PATH, bad).then().statusCode(422);
    }

    // ---- impossible input (422) -------------------------------------------------------------------------------

    @Test
    void an_unbalanced_winding_is_a_422_naming_alternator_winding_slots() {
        assertInfeasible(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.winding.slots", 12)
                        .set("alternator.winding.poles", 12).json()), PATH,
                "alternator.winding.slots")
                .body("detail", startsWith("12 slots with 12 poles and 3 phases"))
                .body("detail", containsString("cannot be balanced"));
    }

    @Test
    void wire_that_cannot_fit_its_window_is_a_422_naming_the_wire() {
        assertInfeasible(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.turnsPerCoil", 2000).json()), PATH,
                "alternator.wire")
                .body("detail", startsWith("the turns do not fit their window"));
    }

    // ---- invalid input (400) ----------------------------------------------------------------------------------

    @Test
    void a_reversed_speed_range_is_refused() {
        String body = Bodies.exampleDesign(AXIAL).set("speedRange.minRpm", 500.0).set("speedRange.maxRpm", 100.0).json();
        assertOneInvalidField(post(PATH, body), PATH, "speedRange.maxRpm", "100.0",
                "speedRange.maxRpm = 100.0: must be above minRpm = 500.0 (the range is empty or reversed)", "> minRpm");
    }

    @Test
    void parallel_paths_that_do_not_divide_the_coils_are_refused_with_the_allowed_counts() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.winding.parallelPaths", 3).json()),
                PATH, "alternator.winding.parallelPaths", "3",
                // 15 coils in 3 phases; t = gcd(15, 10) = 5 identical sections hold one coil of each phase, so a
                // phase's 5 coils split into 1 or 5 identical groups only
                "alternator.winding.parallelPaths = 3: the 5 coils of each phase cannot be split into 3 identical groups;"
                        + " allowed: 1, 5", "1, 5");
    }

    @Test
    void an_unknown_rotor_type_lists_the_kinds() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.rotor.type", "Hexagon").json()), PATH,
                "alternator.rotor.type", "Hexagon",
                "alternator.rotor.type = \"Hexagon\": must be one of RadialSurfaceRotor, AxialDualRotor",
                "one of RadialSurfaceRotor, AxialDualRotor");
    }

    @Test
    void a_missing_load_type_asks_for_the_kind() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).remove("load.type").json()), PATH,
                "load.type", "missing", "load.type is missing: name the kind, one of BatteryLoad, ResistiveLoad",
                "one of BatteryLoad, ResistiveLoad");
    }

    @Test
    void a_rotor_with_the_wrong_stator_is_refused() {
        String body = Bodies.exampleDesign(AXIAL).set("alternator.stator", Map.of("type", "SlottedStator",
                "slotDepthM", 0.02, "slotWidthM", 0.01, "toothTipHeightM", 0.001, "slotLinerThicknessM", 0.0003,
                "endExtensionM", 0.01)).json();
        assertOneInvalidField(post(PATH, body), PATH, "alternator.stator", "slotted",
                "alternator.stator = slotted: an axial dual rotor runs over an air-cored coil stator", "air-cored stator");
    }

    @Test
    void a_missing_field_is_named_by_its_path() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).remove("alternator.turnsPerCoil").json()), PATH,
                "alternator.turnsPerCoil", "missing", "alternator.turnsPerCoil is missing: a value is required",
                "a whole number");
    }

    @Test
    void a_string_for_a_number_is_refused() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.rotor.magnetThicknessM", "ten").json()),
                PATH, "alternator.rotor.magnetThicknessM", "ten",
                "alternator.rotor.magnetThicknessM = \"ten\": must be a finite number", "a finite number");
    }

    @Test
    void a_negative_magnet_thickness_is_refused_with_its_range() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.rotor.magnetThicknessM", -0.01).json()),
                PATH, "alternator.rotor.magnetThicknessM", "-0.01",
                "alternator.rotor.magnetThicknessM = -0.01: must be between 5.0E-4 and 0.1", "5.0E-4 to 0.1");
    }

    @Test
    void NaN_as_a_string_is_refused() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("speedRange.maxRpm", "NaN").json()), PATH,
                "speedRange.maxRpm", "NaN", "speedRange.maxRpm = \"NaN\": must be a finite number", "a finite number");
    }

    @Test
    void NaN_as_a_bare_token_is_malformed_json() {
        assertMalformed(post(PATH, Bodies.exampleDesign(AXIAL).raw("speedRange.maxRpm", "NaN").json()), PATH,
                "Malformed JSON at line 1, column");
    }

    @Test
    void a_huge_number_is_out_of_range() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.rotor.magnetThicknessM", 1e308).json()),
                PATH, "alternator.rotor.magnetThicknessM", "1.0E308",
                "alternator.rotor.magnetThicknessM = 1.0E308: must be between 5.0E-4 and 0.1", "5.0E-4 to 0.1");
    }

    @Test
    void a_billion_slots_is_out_of_range() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.winding.slots", 1_000_000_000).json()),
                PATH, "alternator.winding.slots", "1000000000",
                "alternator.winding.slots = 1000000000: must be between 2 and 400", "2 to 400");
    }

    @Test
    void too_many_speed_points_are_refused() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("speedRange.points", 1_000_000).json()), PATH,
                "speedRange.points", "1000000", "speedRange.points = 1000000: must be between 2 and 1000", "2 to 1000");
    }

    @Test
    void an_unknown_field_is_refused_with_the_known_ones() {
        assertOneInvalidField(post(PATH, Bodies.exampleDesign(AXIAL).set("alternator.rotor.colour", "red").json()), PATH,
                "alternator.rotor.colour", "red", "alternator.rotor.colour: unknown field",
                "known fields: gradeName, magnetWidthM, magnetLengthM, magnetCentreRadiusM, magnetThicknessM, "
                        + "coilLayerThicknessM, clearancePerSideM");
    }

    @Test
    void every_invalid_field_across_the_request_is_listed_at_once() {
        String body = Bodies.exampleDesign(AXIAL).set("alternator.rotor.magnetThicknessM", -1.0)
                .set("alternator.turnsPerCoil", "many").set("load.battery.cells", 0)
                .set("speedRange.points", 1).set("extra", 1).json();
        Response r = post(PATH, body);
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(400).body("detail", equalTo("5 fields are invalid."))
                .body("errors.field", containsInAnyOrder("extra", "alternator.rotor.magnetThicknessM",
                        "alternator.turnsPerCoil", "load.battery.cells", "speedRange.points"));
    }

    @Test
    void a_body_that_is_not_an_object_is_refused() {
        assertOneInvalidField(post(PATH, "[]"), PATH, "body", "[]", "body = []: must be a JSON object", "a JSON object");
    }

    @Test
    void an_empty_body_is_malformed() {
        assertMalformed(post(PATH, ""), PATH, "The request body is empty: a JSON object is required.");
    }

    @Test
    void broken_json_is_malformed_with_its_position() {
        assertMalformed(post(PATH, "{\"alternator\": {\n\"winding\": [}"), PATH, "Malformed JSON at line 2, column");
    }

    @Test
    void a_body_over_the_limit_is_a_413() {
        ProblemAssertions.assertTooLarge(PATH);
    }

    @Test
    void no_error_answer_carries_a_stack_trace() {
        given().contentType("application/json").body("{\"alternator\": 1}").post(PATH).then().statusCode(400)
                .body(not(containsString("Exception"))).body(not(containsString("at coilwright.")))
                .body("errors", hasSize(5));
    }
}
