package coilwright.store;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class DraftRevisionTest {
    static List<String> fields(InvalidInputException e) {
        return e.errors().stream().map(FieldError::field).toList();
    }

    @Test
    void text_at_the_limits_is_accepted() {
        String input = "[" + "0".repeat(DraftRevision.MAX_INPUT_JSON_BYTES - 2) + "]";
        DraftRevision d = new DraftRevision("t".repeat(200), "n".repeat(20_000), input, "{}", "v".repeat(100), 1);
        assertEquals(200, d.title().length());
    }

    @Test
    void each_oversize_field_is_named_with_its_limit() {
        String input = "[" + "0".repeat(DraftRevision.MAX_INPUT_JSON_BYTES - 1) + "]";
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new DraftRevision("t".repeat(201), "n".repeat(20_001), input, "{}", "v".repeat(101), 0));
        assertEquals(List.of("title", "notes", "inputJson", "toolVersion", "schemaVersion"), fields(e));
        assertTrue(e.getMessage().contains("title = 201 characters: must be at most 200 characters"), e.getMessage());
        assertTrue(e.getMessage().contains("inputJson = 262145 bytes"), e.getMessage());
    }

    @Test
    void the_input_limit_counts_utf8_bytes_not_characters() {
        String twoByte = "é".repeat(DraftRevision.MAX_INPUT_JSON_BYTES / 2 + 1);
        assertTrue(twoByte.length() < DraftRevision.MAX_INPUT_JSON_BYTES);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new DraftRevision("t", "", twoByte, "{}", "v", 1));
        assertEquals(List.of("inputJson"), fields(e));
    }

    @Test
    void utf8_length_agrees_with_the_encoder() {
        for (String s : List.of("", "abc", "é", "€", "🌬️💧", "a\u00e9\u20ac\ud83d\ude00z")) {
            assertEquals(s.getBytes(StandardCharsets.UTF_8).length, DraftRevision.utf8Length(s), s);
        }
    }

    @Test
    void missing_fields_are_all_reported_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new DraftRevision(null, null, null, null, null, 1));
        assertEquals(List.of("title", "notes", "inputJson", "resultJson", "toolVersion"), fields(e));
    }

    @Test
    void nul_characters_and_lone_surrogates_are_refused() {
        assertEquals(List.of("title"), fields(assertThrows(InvalidInputException.class,
                () -> new DraftRevision("a\u0000b", "", "{}", "{}", "v", 1))));
        assertEquals(List.of("notes"), fields(assertThrows(InvalidInputException.class,
                () -> new DraftRevision("a", "x\ud800", "{}", "{}", "v", 1))));
        assertEquals(List.of("inputJson"), fields(assertThrows(InvalidInputException.class,
                () -> new DraftRevision("a", "", "\udc00{}", "{}", "v", 1))));
        assertEquals(List.of("inputJson"), fields(assertThrows(InvalidInputException.class,
                () -> new DraftRevision("a", "", "", "{}", "v", 1))), "an empty input is refused");
        assertEquals(-1, DraftRevision.firstInvalidChar("ok 😀 <b>"));
    }

    @Test
    void same_content_compares_title_notes_and_input_only() {
        DraftRevision d = new DraftRevision("t", "n", "{}", "{\"r\":1}", "v", 1);
        assertTrue(d.sameContentAs("t", "n", "{}"));
        assertFalse(d.sameContentAs("t", "n", "{ }"));
        assertFalse(d.sameContentAs("T", "n", "{}"));
    }
}
