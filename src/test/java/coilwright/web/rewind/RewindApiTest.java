package coilwright.web.rewind;

import coilwright.web.OpenApiContract;
import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.startsWith;

import com.fasterxml.jackson.databind.node.ObjectNode;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.rewind.ExistingMachine;
import coilwright.rewind.Measurements;
import coilwright.rewind.RewindTarget;
import coilwright.rewind.Terminals;
import coilwright.service.DesignDocument;
import coilwright.web.Json;
import coilwright.web.TestApp;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** POST /api/v1/rewind and /api/v1/rewind/stator-options against the real app. */
class RewindApiTest {
    private static final String PLAN = "/api/v1/rewind";
    private static final String STATOR = "/api/v1/rewind/stator-options";
    private static final double EXACT = 1e-12;

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Response post(String path, Object body) {
        return given().contentType("application/json").body(body.toString()).post(path);
    }

    @Test
    void a_measured_machine_gets_a_plan_that_matches_its_documented_schema() {
        Response r = post(PLAN, Bodies.request());
        r.then().statusCode(200).contentType(startsWith("application/json"));
        OpenApiContract.assertMatches(r, PLAN, "POST");
        JsonPath j = r.jsonPath();
        assertEquals(Bodies.VOLTS / Bodies.RPM, j.getDouble("characterisation.keLineRmsVPerRpm.value"), EXACT);
        // voltage 1 % and speed 1 % in quadrature (GUM): sqrt(2) %
        assertEquals(Math.sqrt(2) / 100, j.getDouble("characterisation.keLineRmsVPerRpm.relativeUncertainty"), 1e-12);
        assertEquals(16, j.getInt("characterisation.poles"));
        assertFalse(j.getList("characterisation.derivedFrom").isEmpty());
        List<Number> deviations = j.getList("reconnections.relativeDeviation");
        for (int i = 1; i < deviations.size(); i++) {
            assertTrue(Math.abs(deviations.get(i - 1).doubleValue()) <= Math.abs(deviations.get(i).doubleValue()) + 1e-9,
                    "reconnections ranked closest first: " + deviations);
        }
        assertTrue(j.getBoolean("rewinds[0].wireChoices[0].phaseResistanceOhm != null"));
    }

    @Test
    void star_to_delta_reconnection_divides_the_line_ke_by_root_three() {
        JsonPath j = post(PLAN, Bodies.request()).then().statusCode(200).extract().jsonPath();
        double star = j.getDouble("reconnections.find { it.connection == 'STAR' && it.parallelPaths == 1 }.keLineRmsVPerRpm");
        double delta = j.getDouble("reconnections.find { it.connection == 'DELTA' && it.parallelPaths == 1 }.keLineRmsVPerRpm");
        assertEquals(Bodies.VOLTS / Bodies.RPM, star, EXACT);
        assertEquals(star / Math.sqrt(3), delta, EXACT);
        // a battery cut-in scales the other way: sqrt(2) Ke n = Vb + 2 Vd
        double deltaCutIn = j.getDouble("reconnections.find { it.connection == 'DELTA' && it.parallelPaths == 1 }.achieved");
        assertEquals((24 + 1.6) / (Math.sqrt(2) * delta), deltaCutIn, 1e-9);
    }

    @Test
    void a_round_trip_from_an_evaluated_design_recovers_its_pole_count_and_the_turns_of_a_rewound_one() throws IOException {
        AlternatorSpec spec = example("examples/axial-wind-48v.json").alternator();
        Alternator now = AlternatorModel.build(spec);
        int wantedTurns = spec.turnsPerCoil() * 3 / 4;
        Alternator rewound = AlternatorModel.build(spec.withTurnsPerCoil(wantedTurns));
        double rLine = now.phaseResistanceHotOhm() * Terminals.lineResistanceFactor(3, spec.connection());
        Measurements read = Measurements.of(now.emfLineRmsV(Bodies.RPM), Bodies.RPM, now.frequencyHz(Bodies.RPM),
                rLine, spec.windingTempC());
        ExistingMachine measured = new ExistingMachine(spec.winding().slots(), 0, 3, spec.winding().layers(), 0,
                spec.connection(), 0, 1, spec.turnsPerCoil(), spec.wire(), Optional.empty(), read);
        RewindTarget target = RewindTarget.lineVoltage(rewound.emfLineRmsV(500), 500, 500);

        JsonPath j = post(PLAN, Bodies.request(measured, target)).then().statusCode(200).extract().jsonPath();
        assertEquals(spec.winding().poles(), j.getInt("characterisation.poles"));
        assertTrue(j.getBoolean("characterisation.polesInferred"));
        assertEquals(wantedTurns, j.getInt("rewinds[0].turnsPerCoil"));
        assertEquals(spec.connection().name(), j.getString("rewinds[0].connection"));
        double keRewound = rewound.emfLineRmsV(500) / 500;
        assertEquals(keRewound, j.getDouble("rewinds[0].keLineRmsVPerRpm"), 0.005 * keRewound);
        // the resistance read at the working temperature gives back the model's mean turn: same coil, same copper
        double r20 = j.getDouble("characterisation.phaseResistance20COhm.value");
        assertEquals(now.phaseResistanceHotOhm(), r20 * coilwright.conductor.Copper.resistanceRatio(spec.windingTempC()),
                1e-9 * r20);
    }

    @Test
    void with_resistance_and_inductance_measured_each_option_predicts_current_and_a_consistent_copper_loss() {
        ObjectNode body = Bodies.request();
        Bodies.measurements(body).put("lineInductanceH", 0.004);
        Response r = post(PLAN, body);
        r.then().statusCode(200);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        JsonPath j = r.jsonPath();
        String now = "reconnections.find { it.unchanged }";
        double current = j.getDouble(now + ".output.phaseCurrentRmsA");
        double resistance = j.getDouble(now + ".phaseResistanceOhm");
        assertTrue(j.getDouble(now + ".output.dcCurrentA") > 0, "the machine as it is cuts in below 400 rpm");
        assertEquals(3 * current * current * resistance, j.getDouble(now + ".output.copperLossW"),
                1e-9 * j.getDouble(now + ".output.copperLossW"));
        // R at the 60 C target from the 20 C reading: IEC 60028, alpha20 = 0.00393 /K
        assertEquals(1.45 / 2 * (1 + 0.00393 * 40), resistance, 1e-9);
    }

    @Test
    void a_working_speed_just_above_the_wanted_cut_in_still_gets_an_answer() {
        // regression: the bridge solver used to give up on the many switching events just above cut-in
        for (double cutIn : new double[] {395, 399, 399.9, 400, 401}) {
            ObjectNode body = Bodies.request(Bodies.machine(), RewindTarget.battery(24, cutIn, 400));
            Bodies.measurements(body).put("lineInductanceH", 0.004);
            post(PLAN, body).then().statusCode(200);
        }
    }

    @Test
    void a_coil_window_adds_a_fill_check_to_every_wire_choice() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).putObject("coilWindow").put("areaM2", 0.016 * 0.013).put("kind", "AIR_CORED");
        Response r = post(PLAN, body);
        r.then().statusCode(200);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        List<Object> fills = r.jsonPath().getList("rewinds.wireChoices.flatten().fill");
        assertFalse(fills.isEmpty());
        assertTrue(fills.stream().allMatch(f -> f instanceof Map<?, ?> m && m.containsKey("level")), fills.toString());
    }

    @Test
    void the_coil_window_may_be_left_out() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).remove("coilWindow");
        post(PLAN, body).then().statusCode(200).body("rewinds[0].wireChoices[0].fill", equalTo(null));
    }

    @Test
    void a_pole_count_that_does_not_fit_the_frequency_and_speed_is_refused_naming_machine_poles() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).put("poles", 14);
        Response r = post(PLAN, body);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        r.then().statusCode(400).contentType(startsWith("application/problem+json"))
                .body("errors.size()", equalTo(1))
                .body("errors[0].field", equalTo("machine.poles"))
                .body("errors[0].message", startsWith("machine.poles = 14: does not fit the measured 40.0 Hz at 300 rpm,"
                        + " which implies 16 poles"));
    }

    @Test
    void a_resistance_impossible_for_the_turns_and_wire_is_refused_with_the_contradiction() {
        ObjectNode body = Bodies.request();
        Bodies.measurements(body).put("lineResistanceOhm", 1e-5);
        Response r = post(PLAN, body);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        r.then().statusCode(400)
                .body("errors[0].field", equalTo("machine.measurements.lineResistanceOhm"))
                .body("errors[0].message", startsWith("machine.measurements.lineResistanceOhm = 1.0E-5: too low for"
                        + " 60 turns per coil of AWG 16"))
                .body("errors[0].message", containsString("shorter than a circle round the wire itself"));
    }

    @Test
    void a_coil_count_that_does_not_match_the_layout_is_refused_under_machine() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).put("coilsPerPhase", 5);
        post(PLAN, body).then().statusCode(400)
                .body("errors[0].field", equalTo("machine.coilsPerPhase"))
                .body("errors[0].message", startsWith("machine.coilsPerPhase = 5: a double-layer 3-phase winding on"
                        + " 12 slots has 4 coils per phase"));
    }

    @Test
    void non_finite_numbers_are_refused_whether_written_as_text_as_a_token_or_out_of_range() {
        String text = Bodies.request().toString();
        post(PLAN, text.replace("\"measuredSpeedRpm\":300.0", "\"measuredSpeedRpm\":\"NaN\""))
                .then().statusCode(400).body("errors[0].field", equalTo("machine.measurements.measuredSpeedRpm"));
        post(PLAN, text.replace("\"measuredSpeedRpm\":300.0", "\"measuredSpeedRpm\":1e400"))
                .then().statusCode(400).body("errors[0].field", equalTo("machine.measurements.measuredSpeedRpm"))
                .body("errors[0].message", containsString("must be a finite number"));
        Response token = post(PLAN, text.replace("\"measuredSpeedRpm\":300.0", "\"measuredSpeedRpm\":NaN"));
        OpenApiContract.assertMatches(token, PLAN, "POST");
        token.then().statusCode(400).body("type", equalTo("/problems/malformed-json"));
    }

    @Test
    void every_missing_or_out_of_range_field_is_listed_at_once_with_its_path() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).remove("turnsPerCoil");
        ((ObjectNode) body.get("target")).remove("targetSpeedRpm");
        Bodies.measurements(body).put("voltageAccuracyPercent", 80);
        ((ObjectNode) body.get("machine").get("wire")).put("awg", 99);
        Response r = post(PLAN, body);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        r.then().statusCode(400).body("errors.field", hasItems("machine.turnsPerCoil", "target.targetSpeedRpm",
                "machine.measurements.voltageAccuracyPercent", "machine.wire.awg"));
    }

    @Test
    void measurements_are_required_for_a_plan() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).remove("measurements");
        post(PLAN, body).then().statusCode(400).body("errors.field", hasItems("machine.measurements"));
    }

    @Test
    void a_winding_that_cannot_be_balanced_is_422_naming_the_machine_field() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("machine")).put("poles", 12);
        Bodies.measurements(body).put("measuredFrequencyHz", 0);
        Response r = post(PLAN, body);
        OpenApiContract.assertMatches(r, PLAN, "POST");
        r.then().statusCode(422).body("type", equalTo("/problems/infeasible-design"))
                .body("field", equalTo("machine.slots"));
    }

    @Test
    void a_bare_twelve_slot_stator_lists_ten_and_fourteen_poles_first_and_never_twelve() {
        // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010, tooth-coil tables: 12 slots with 10 or 14 poles
        // kw1 = 0.933, with 8 or 16 poles 0.866; 12 slots / 12 poles is not a balanced winding
        Response r = post(STATOR, "{\"slots\":12,\"phases\":3,\"layers\":\"DOUBLE\",\"minPoles\":8,\"maxPoles\":16}");
        r.then().statusCode(200);
        OpenApiContract.assertMatches(r, STATOR, "POST");
        JsonPath j = r.jsonPath();
        List<Integer> poles = j.getList("options.poles");
        assertEquals(List.of(10, 14), poles.subList(0, 2).stream().sorted().toList());
        assertEquals(0.9330, j.getDouble("options[0].fundamentalWindingFactor"), 5e-5);
        assertEquals(List.of(8, 16), poles.subList(2, 4).stream().sorted().toList());
        assertEquals(0.8660, j.getDouble("options[2].fundamentalWindingFactor"), 5e-5);
        assertFalse(poles.contains(12), "12 slots / 12 poles cannot be balanced");
    }

    @Test
    void stator_options_come_in_the_order_asked_for_and_say_which() {
        Response plain = post(STATOR, "{\"slots\":12,\"phases\":3,\"layers\":\"DOUBLE\",\"minPoles\":2,\"maxPoles\":16}");
        plain.then().statusCode(200).body("rankBy", equalTo("WINDING_FACTOR"));
        Response balanced = post(STATOR, "{\"slots\":12,\"phases\":3,\"layers\":\"DOUBLE\",\"minPoles\":2,"
                + "\"maxPoles\":16,\"rankBy\":\"BALANCED\"}");
        OpenApiContract.assertMatches(balanced, STATOR, "POST");
        // 4 poles (factor 1) and 14 poles (84 cogging cycles) are beaten on no count; see PoleRankingTest
        balanced.then().statusCode(200).body("rankBy", equalTo("BALANCED"))
                .body("options.poles", equalTo(List.of(4, 14, 2, 10, 16, 8)));
        post(STATOR, "{\"slots\":12,\"phases\":3,\"layers\":\"DOUBLE\",\"minPoles\":2,\"maxPoles\":16,"
                + "\"rankBy\":\"CHEAPEST\"}").then().statusCode(400).body("errors[0].field", equalTo("rankBy"));
    }

    @Test
    void stator_options_refuse_bad_counts_all_at_once() {
        Response r = post(STATOR, "{\"slots\":1,\"phases\":2,\"layers\":\"DOUBLE\",\"minPoles\":20,\"maxPoles\":10}");
        OpenApiContract.assertMatches(r, STATOR, "POST");
        r.then().statusCode(400).body("errors.field", hasItems("slots", "phases", "maxPoles"))
                .body("errors.find { it.field == 'maxPoles' }.message", equalTo("maxPoles = 10: must be >= minPoles (20)"));
        post(STATOR, "{\"slots\":12,\"phases\":3,\"layers\":\"TRIPLE\",\"minPoles\":2,\"maxPoles\":10}")
                .then().statusCode(400).body("errors[0].field", equalTo("layers"))
                .body("errors[0].allowed", equalTo("one of SINGLE, DOUBLE"));
    }

    @Test
    void unknown_fields_are_refused() {
        ObjectNode body = Bodies.request();
        ((ObjectNode) body.get("target")).put("cutInRpm", 150);
        post(PLAN, body).then().statusCode(400).body("errors[0].field", equalTo("target.cutInRpm"))
                .body("errors[0].message", containsString("unknown field"));
    }

    private static coilwright.system.EvaluationRequest example(String resource) throws IOException {
        try (InputStream in = RewindApiTest.class.getClassLoader().getResourceAsStream(resource)) {
            return Json.mapper().readValue(in, DesignDocument.class).design();
        }
    }
}
