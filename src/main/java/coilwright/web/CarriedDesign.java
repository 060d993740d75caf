package coilwright.web;

import coilwright.system.EvaluationRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.ByteArrayOutputStream;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.zip.DataFormatException;
import java.util.zip.Deflater;
import java.util.zip.Inflater;

/**
 * A design carried from page to page in one form field or query parameter, {@value #FIELD}: the design's own
 * document (the API's JSON of an {@link EvaluationRequest}, SI units) deflated and written in URL-safe Base64, so a
 * results page can hand its design to the match pages, the save form or back to the design form without a database,
 * and every page reached that way has a link of its own (about 900 characters for the examples). Reading it binds
 * the JSON with the API's own checks; an unreadable or invalid carrier is one error on the field {@value #FIELD}.
 */
public final class CarriedDesign {
    /** The form field and query parameter that carries a design. */
    public static final String FIELD = "design";
    /** The most a carried design may inflate to; the examples take about 1.2 kB. */
    static final int MAX_JSON_BYTES = 64 * 1024;
    private static final RecordBinder BINDER = new RecordBinder(Json.mapper());

    private CarriedDesign() {
    }

    /** The design as the text of the carrier field. */
    public static String encode(EvaluationRequest design) {
        byte[] json;
        try {
            json = Json.mapper().writeValueAsBytes(design);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the design as JSON: " + e.getOriginalMessage(), e);
        }
        Deflater deflater = new Deflater(Deflater.BEST_COMPRESSION, true);
        deflater.setInput(json);
        deflater.finish();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buf = new byte[4096];
        while (!deflater.finished()) {
            out.write(buf, 0, deflater.deflate(buf));
        }
        deflater.end();
        return Base64.getUrlEncoder().withoutPadding().encodeToString(out.toByteArray());
    }

    /**
     * The design a carrier field holds, checked as the API checks it.
     *
     * @throws InvalidInputException naming the field {@value #FIELD} when it is missing, unreadable or invalid
     */
    public static EvaluationRequest decode(String text) {
        if (text == null || text.isBlank()) {
            throw refused("", "missing");
        }
        String json = inflate(text.strip());
        try {
            return BINDER.bind(json, EvaluationRequest.class);
        } catch (InvalidInputException e) {
            throw refused(text, e.errors().get(0).message());
        } catch (MalformedJsonException e) {
            throw refused(text, "not a design document");
        }
    }

    /** {@code path?design=...}: a link that hands the design to another page. */
    public static String link(String path, EvaluationRequest design) {
        return path + (path.contains("?") ? "&" : "?") + FIELD + "=" + URLEncoder.encode(encode(design), StandardCharsets.UTF_8);
    }

    private static String inflate(String text) {
        byte[] packed;
        try {
            packed = Base64.getUrlDecoder().decode(text);
        } catch (IllegalArgumentException e) {
            throw refused(text, "not in the carrier's encoding");
        }
        Inflater inflater = new Inflater(true);
        inflater.setInput(packed);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buf = new byte[4096];
        try {
            while (!inflater.finished()) {
                int n = inflater.inflate(buf);
                if (n == 0 && (inflater.needsInput() || inflater.needsDictionary())) {
                    throw refused(text, "cut short");
                }
                out.write(buf, 0, n);
                if (out.size() > MAX_JSON_BYTES) {
                    throw refused(text, "larger than " + MAX_JSON_BYTES + " bytes");
                }
            }
        } catch (DataFormatException e) {
            throw refused(text, "not in the carrier's encoding");
        } finally {
            inflater.end();
        }
        return out.toString(StandardCharsets.UTF_8);
    }

    private static InvalidInputException refused(String text, String why) {
        String shown = text.length() > 40 ? text.substring(0, 40) + "…" : text;
        return new InvalidInputException(new FieldError(FIELD, shown, "The design this page was given cannot be read ("
                + why + "); open it again from the design form or a saved design.", "a design handed on by a results page"));
    }
}
