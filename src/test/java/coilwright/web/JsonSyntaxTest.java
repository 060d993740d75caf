package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Malformed request bodies are described in our own words: where, in which value, and what was expected. */
class JsonSyntaxTest {
    /** Words of the parser library that must never reach a client. */
    private static final List<String> LIBRARY_WORDS = List.of("JsonReadFeature", "StreamReadFeature", "FAIL_ON",
            "ALLOW_", "com.fasterxml", "jackson", "Exception", "enable `", "(code ", "JsonToken", "Source:", "REDACTED");

    private final JsonSyntax syntax = new JsonSyntax(Json.mapper());

    private MalformedJsonException refused(String json) {
        return assertThrows(MalformedJsonException.class, () -> syntax.parse(json));
    }

    private static void assertOurWords(String message) {
        for (String word : LIBRARY_WORDS) {
            assertFalse(message.contains(word), "'" + word + "' in: " + message);
        }
    }

    @Test
    void a_bare_NaN_is_named_as_not_a_number_with_its_place_and_path() {
        MalformedJsonException e = refused("{\"alternator\": {\"winding\": {\"slots\": NaN}}}");
        // column 38 is the N of NaN
        assertEquals("Malformed JSON at line 1, column 38 (in alternator.winding.slots): not a number: use a finite decimal.",
                e.getMessage());
        assertEquals("alternator.winding.slots", e.path());
        assertEquals(1, e.line());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "{\"a\": Infinity}",
            "{\"a\": -Infinity}",
            "{\"a\": [1, 2, NaN]}"})
    void every_non_numeric_token_gets_the_same_words(String json) {
        MalformedJsonException e = refused(json);
        assertTrue(e.getMessage().endsWith(": not a number: use a finite decimal."), e.getMessage());
        assertOurWords(e.getMessage());
    }

    @Test
    void an_array_element_is_named_by_its_index() {
        assertEquals("stator.coils[1].turns", refused("{\"stator\": {\"coils\": [{\"turns\": 1}, {\"turns\": NaN}]}}").path());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "{\"a\": 1} {\"b\": 2}                 | expected the end of the body after the JSON value, found more text",
            "{\"a\": 1,}                           | expected a field name in double quotes",
            "{a: 1}                                | expected a field name in double quotes",
            "{\"a\" 1}                             | expected ':' between a field name and its value",
            "{\"a\": 1 \"b\": 2}                   | expected ',' before the next field or '}' to close the object",
            "[1 2]                                 | expected ',' before the next element or ']' to close the array",
            "{\"a\": {\"b\": 1}                    | the body ends before the JSON value is complete",
            "{\"a\": 1, \"a\": 2}                  | a field appears twice in the same object",
            "{\"a\": 007}                          | a number must not start with 0",
            "{\"a\": tru}                          | expected a value: a number, a string in double quotes, true, false, null, an object or an array; found 'tru'",
            "{\"a\": }                             | expected a value",
            "{\"a\": [1, 2}                        | a closing bracket does not match the opening one"})
    void says_what_was_expected_in_its_own_words(String json, String expected) {
        MalformedJsonException e = refused(json);
        assertTrue(e.getMessage().startsWith("Malformed JSON at line 1, column "), e.getMessage());
        assertTrue(e.getMessage().contains(expected), e.getMessage());
        assertOurWords(e.getMessage());
    }

    @Test
    void a_raw_line_break_in_a_string_is_named_on_its_line() {
        MalformedJsonException e = refused("{\"title\": \"two\nlines\"}");
        assertTrue(e.getMessage().contains("a string may not hold a raw line break"), e.getMessage());
        assertOurWords(e.getMessage());
    }

    @Test
    void the_line_and_column_point_into_a_multi_line_body() {
        MalformedJsonException e = refused("{\"slots\": 12,\n \"poles\": }");
        assertEquals(2, e.line());
        assertTrue(e.column() > 1);
        assertTrue(e.getMessage().startsWith("Malformed JSON at line 2, column "), e.getMessage());
    }

    @Test
    void an_empty_body_is_named_as_such() {
        assertEquals("The request body is empty: a JSON object is required.", refused(" ").getMessage());
    }

    @Test
    void a_well_formed_body_parses() {
        assertEquals(12, syntax.parse("{\"slots\": 12}").get("slots").intValue());
    }
}
