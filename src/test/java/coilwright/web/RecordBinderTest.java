package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

class RecordBinderTest {
    private final RecordBinder binder = new RecordBinder(Json.mapper());

    private Map<String, FieldError> errorsOf(String json) {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> binder.bind(json, SampleDesign.class));
        return e.errors().stream().collect(Collectors.toMap(FieldError::field, f -> f, (a, b) -> a));
    }

    private static String valid(String from, String to) {
        String json = SampleDesign.validJson();
        assertTrue(json.contains(from), "fixture contains " + from);
        return json.replace(from, to);
    }

    @Test
    void binds_a_valid_nested_body_into_records() {
        SampleDesign d = binder.bind(SampleDesign.validJson(), SampleDesign.class);
        assertEquals("test rig", d.name());
        assertEquals(0.002, d.rotor().airGapM(), 0.0);
        assertEquals(SampleDesign.Grade.N42, d.rotor().magnet().grade());
        assertEquals(Optional.of(5.0), d.stator().skewDeg());
        assertEquals(40, d.stator().coils().get(0).turns());
        assertEquals(Optional.empty(), d.note());
    }

    @Test
    void reports_missing_fields_with_their_dotted_paths() {
        Map<String, FieldError> errors = errorsOf(valid("\"airGapM\": 0.002, ", ""));
        assertEquals(Map.of("rotor.airGapM", "rotor.airGapM is missing: a value is required"),
                Map.of("rotor.airGapM", errors.get("rotor.airGapM").message()));
        assertEquals("a finite number", errors.get("rotor.airGapM").allowed());
    }

    @Test
    void reports_a_string_where_a_number_is_needed() {
        Map<String, FieldError> errors = errorsOf(valid("\"poles\": 8", "\"poles\": \"eight\""));
        assertEquals("rotor.poles = \"eight\": must be a whole number", errors.get("rotor.poles").message());
        assertEquals("eight", errors.get("rotor.poles").value());
    }

    @Test
    void refuses_a_string_NaN_and_a_number_too_large_for_a_double() {
        Map<String, FieldError> errors = errorsOf(valid("\"airGapM\": 0.002", "\"airGapM\": \"NaN\"")
                .replace("\"thicknessM\": 0.01", "\"thicknessM\": 1e400"));
        assertEquals(2, errors.size(), errors.toString());
        assertTrue(errors.get("rotor.airGapM").message().endsWith("must be a finite number"));
        assertTrue(errors.get("rotor.magnet.thicknessM").message().endsWith("must be a finite number"));
    }

    @Test
    void refuses_fractions_and_out_of_range_values_for_whole_numbers() {
        Map<String, FieldError> errors = errorsOf(valid("\"poles\": 8", "\"poles\": 8.5")
                .replace("\"slots\": 12", "\"slots\": 99999999999"));
        assertEquals("rotor.poles = 8.5: must be a whole number", errors.get("rotor.poles").message());
        assertEquals("stator.slots = 99999999999: is out of range", errors.get("stator.slots").message());
    }

    @Test
    void reports_unknown_fields_with_the_known_ones() {
        FieldError e = errorsOf(valid("\"poles\": 8", "\"poles\": 8, \"polls\": 8")).get("rotor.polls");
        assertEquals("rotor.polls: unknown field", e.message());
        assertEquals("known fields: airGapM, poles, magnet", e.allowed());
    }

    @Test
    void lists_the_allowed_enum_names() {
        FieldError e = errorsOf(valid("\"N42\"", "\"N99\"")).get("rotor.magnet.grade");
        assertEquals("one of N35, N42, N52", e.allowed());
        assertEquals("rotor.magnet.grade = \"N99\": must be one of N35, N42, N52", e.message());
    }

    @Test
    void rebases_compact_constructor_errors_under_the_nested_path() {
        FieldError e = errorsOf(valid("\"airGapM\": 0.002", "\"airGapM\": -1.0")).get("rotor.airGapM");
        assertEquals("rotor.airGapM = -1.0: must be > 0", e.message());
        assertEquals("> 0", e.allowed());
    }

    @Test
    void collects_errors_from_sibling_and_deeper_records_at_once() {
        String json = valid("\"airGapM\": 0.002", "\"airGapM\": 0.0")
                .replace("\"thicknessM\": 0.01", "\"thicknessM\": 0.5")
                .replace("\"turns\": 40", "\"turns\": 0")
                .replace("\"airCored\": false", "\"airCored\": \"no\"");
        Map<String, FieldError> errors = errorsOf(json);
        assertEquals(List.of("rotor.airGapM", "rotor.magnet.thicknessM", "stator.airCored", "stator.coils[0].turns"),
                errors.keySet().stream().sorted().toList());
    }

    @Test
    void runs_a_parents_own_checks_even_when_a_nested_record_is_invalid() {
        Map<String, FieldError> errors = errorsOf(valid("\"test rig\"", "\" \"").replace("\"poles\": 8", "\"poles\": 7"));
        assertEquals(List.of("name", "rotor.poles"), errors.keySet().stream().sorted().toList());
    }

    @Test
    void does_not_run_a_constructor_when_one_of_its_own_numbers_is_unreadable() {
        Map<String, FieldError> errors = errorsOf(valid("\"airGapM\": 0.002", "\"airGapM\": \"abc\"")
                .replace("\"poles\": 8", "\"poles\": 7"));
        assertEquals(List.of("rotor.airGapM"), List.copyOf(errors.keySet()), "no spurious error from a default value");
    }

    @Test
    void reports_a_blank_name_from_the_root_constructor_without_a_prefix() {
        assertEquals("name = : must not be blank", errorsOf(valid("\"test rig\"", "\"\"")).get("name").message());
    }

    @Test
    void reports_missing_and_null_list_elements_and_wrong_container_types() {
        Map<String, FieldError> errors = errorsOf(valid("[{\"turns\": 40, \"wireDiameterMm\": 1.0}]", "[null]")
                .replace("\"magnet\": {\"grade\": \"N42\", \"thicknessM\": 0.01}", "\"magnet\": [1]"));
        assertEquals("stator.coils[0] is missing: a value is required", errors.get("stator.coils[0]").message());
        assertEquals("rotor.magnet = [1]: must be a JSON object", errors.get("rotor.magnet").message());
    }

    @Test
    void rebases_an_infeasible_design_field_under_its_record() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> binder.bind(valid("\"slots\": 12", "\"slots\": 10"), SampleDesign.class));
        assertEquals("stator.slots", e.field());
    }

    @Test
    void refuses_a_non_object_body() {
        FieldError e = errorsOf("[1, 2]").get("body");
        assertEquals("body = [1,2]: must be a JSON object", e.message());
    }

    @Test
    void refuses_malformed_json_naming_line_and_column() {
        MalformedJsonException e = assertThrows(MalformedJsonException.class,
                () -> binder.bind("{\"name\": \"x\",\n \"rotor\": }", SampleDesign.class));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().startsWith("Malformed JSON at line 2, column"), e.getMessage());
    }

    @Test
    void refuses_an_empty_body_bare_NaN_tokens_trailing_text_and_duplicate_keys() {
        assertThrows(MalformedJsonException.class, () -> binder.bind("  ", SampleDesign.class));
        assertThrows(MalformedJsonException.class, () -> binder.bind("{\"a\": NaN}", SampleDesign.class));
        assertThrows(MalformedJsonException.class, () -> binder.bind("{} {}", SampleDesign.class));
        assertThrows(MalformedJsonException.class, () -> binder.bind("{\"a\": 1, \"a\": 2}", SampleDesign.class));
    }
}
