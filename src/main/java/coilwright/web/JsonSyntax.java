package coilwright.web;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.List;
import java.util.Locale;

/**
 * Reads a request body as one JSON value and, when it is not well-formed, says so in our own words: the line, the
 * column, the path of the value being read and what was expected there. The parser's own wording (its option
 * names, its class names) never reaches a client: its message is only matched against known situations here, and
 * an unknown situation gets a general sentence.
 */
final class JsonSyntax {
    /** A parser situation, recognised by a fragment of the parser's message, and what we say about it. */
    private record Situation(String fragment, String expected) {
    }

    private static final String NOT_A_NUMBER = "not a number: use a finite decimal";
    private static final String TRAILING = "expected the end of the body after the JSON value, found more text";
    private static final List<Situation> SITUATIONS = List.of(
            new Situation("Non-standard token", NOT_A_NUMBER),
            new Situation("Unexpected end-of-input", "the body ends before the JSON value is complete: "
                    + "close every object with } and every array with ]"),
            new Situation("double-quote to start field name", "expected a field name in double quotes "
                    + "(a comma after the last field is not allowed)"),
            new Situation("was expecting a colon", "expected ':' between a field name and its value"),
            new Situation("separate Object entries", "expected ',' before the next field or '}' to close the object"),
            new Situation("separate Array entries", "expected ',' before the next element or ']' to close the array"),
            new Situation("Duplicate field", "a field appears twice in the same object: give each field once"),
            new Situation("Leading zeroes", "a number must not start with 0 unless it is 0 or 0.x"),
            new Situation("Invalid numeric value", "expected a number written as in JSON, e.g. 12, -0.5 or 1.2e-3"),
            new Situation("Illegal unquoted character", "a string may not hold a raw line break or control "
                    + "character: write it as \\n, \\t or \\u00XX"),
            new Situation("Trailing token", TRAILING),
            new Situation("Unexpected close marker", "a closing bracket does not match the opening one"),
            new Situation("Unrecognized token", "expected a value: a number, a string in double quotes, true, false, "
                    + "null, an object or an array"),
            new Situation("expected a valid value", "expected a value: a number, a string in double quotes, true, "
                    + "false, null, an object or an array"));
    private static final String NAN_WORDS = "nan|infinity|inf|-infinity|+infinity|-inf|+inf";

    private final ObjectMapper mapper;

    JsonSyntax(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    /**
     * @throws MalformedJsonException when the text is empty or not exactly one well-formed JSON value
     */
    JsonNode parse(String json) {
        if (json == null || json.isBlank()) {
            throw new MalformedJsonException("The request body is empty: a JSON object is required.", 0, 0, "");
        }
        JsonParser parser = null;
        try {
            parser = mapper.createParser(json);
            JsonNode tree = mapper.readTree(parser);
            JsonLocation end = parser.currentLocation();
            if (more(parser)) {
                throw malformed(end, "", TRAILING);
            }
            return tree;
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            String expected = expected(e.getOriginalMessage(), json, at);
            if (expected.equals(NOT_A_NUMBER)) {
                at = startOfWord(json, at);
            }
            throw malformed(at, path(parser), expected);
        } catch (IOException e) {
            throw malformed(null, "", "the body cannot be read as text");
        } finally {
            close(parser);
        }
    }

    private static boolean more(JsonParser parser) {
        try {
            JsonToken next = parser.nextToken();
            return next != null;
        } catch (IOException e) {
            return true;
        }
    }

    /** What was expected at the fault, in our words. */
    static String expected(String parserMessage, String json, JsonLocation at) {
        String word = wordAt(json, at).toLowerCase(Locale.ROOT);
        if (!word.isEmpty() && ("|" + NAN_WORDS + "|").contains("|" + word + "|")) {
            return NOT_A_NUMBER;
        }
        String message = parserMessage == null ? "" : parserMessage;
        for (Situation s : SITUATIONS) {
            if (message.contains(s.fragment())) {
                return word.isEmpty() || !s.fragment().equals("Unrecognized token") ? s.expected()
                        : s.expected() + "; found '" + word + "'";
            }
        }
        return "expected well-formed JSON";
    }

    /** The word (letters, with a sign) at or just before the fault, e.g. NaN or tru. */
    private static String wordAt(String json, JsonLocation at) {
        if (at == null || at.getCharOffset() < 0) {
            return "";
        }
        int i = (int) Math.min(at.getCharOffset(), json.length());
        int start = i;
        while (start > 0 && wordChar(json.charAt(start - 1))) {
            start--;
        }
        int end = i;
        while (end < json.length() && wordChar(json.charAt(end))) {
            end++;
        }
        return json.substring(start, end);
    }

    /** The location of the first character of the word at {@code at} (the parser reports the end of a bad token). */
    private static JsonLocation startOfWord(String json, JsonLocation at) {
        if (at == null || at.getCharOffset() < 0) {
            return at;
        }
        int i = (int) Math.min(at.getCharOffset(), json.length());
        int start = i;
        while (start > 0 && wordChar(json.charAt(start - 1))) {
            start--;
        }
        return new JsonLocation(at.contentReference(), start, at.getLineNr(), Math.max(1, at.getColumnNr() - (i - start)));
    }

    private static boolean wordChar(char c) {
        return Character.isLetter(c) || c == '+' || c == '-';
    }

    /** The dotted path of the value being read: {@code alternator.winding.slots}, {@code coils[2].turns}. */
    static String path(JsonParser parser) {
        if (parser == null) {
            return "";
        }
        StringBuilder out = new StringBuilder();
        for (JsonStreamContext c = parser.getParsingContext(); c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                out.insert(0, "[" + Math.max(0, c.getCurrentIndex()) + "]");
            } else if (c.getCurrentName() != null) {
                out.insert(0, (c.getParent() != null && !c.getParent().inRoot() ? "." : "") + c.getCurrentName());
            }
        }
        return out.toString();
    }

    private static MalformedJsonException malformed(JsonLocation at, String path, String expected) {
        long line = at == null ? 0 : at.getLineNr();
        long column = at == null ? 0 : at.getColumnNr();
        String where = at == null ? "Malformed JSON" : "Malformed JSON at line " + line + ", column " + column;
        String inPath = path.isEmpty() ? "" : " (in " + path + ")";
        return new MalformedJsonException(where + inPath + ": " + expected + ".", line, column, path);
    }

    private static void close(JsonParser parser) {
        if (parser != null) {
            try {
                parser.close();
            } catch (IOException ignored) {
                // nothing was written; closing a parser over a string cannot lose anything
            }
        }
    }
}
