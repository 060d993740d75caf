package coilwright.web.saved;

import com.fasterxml.jackson.databind.JsonNode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Every operating point of a results snapshot as CSV (RFC 4180: comma separated, CRLF line ends, quoted where
 * needed), one row per speed, a header naming each column with its unit, e.g. {@code Power to load (W)}. Numbers are
 * written as saved, at full precision; a field the snapshot lacks is an empty cell. Above it, comment lines starting
 * with {@code #} say what the file is: title, permanent link, revision, units, when it was saved and the main inputs
 * (readers skip them with a comment marker, e.g. Commons CSV {@code setCommentMarker('#')}).
 *
 * <p>A cell that is not a plain number and starts with {@code = + - @}, a tab or a carriage return gets a leading
 * apostrophe, so a spreadsheet shows it as text instead of running it as a formula (CSV injection, OWASP). Numbers,
 * negative ones included, are left exactly as they are.
 */
final class CurvesCsv {
    private static final String FORMULA_START = "=+-@\t\r";
    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private CurvesCsv() {
    }

    /** The points alone, with no comment lines above the header. */
    static String of(JsonNode results) {
        return of(List.of(), results);
    }

    /** The points under comment lines (each a line of its own; line breaks inside one become spaces). */
    static String of(List<String> comments, JsonNode results) {
        StringWriter out = new StringWriter();
        String[] header = ResultFigures.POINT_COLUMNS.stream().map(ResultFigures.Column::header).toArray(String[]::new);
        String[] lines = comments.stream().map(c -> c.replaceAll("[\\r\\n]+", " ")).toArray(String[]::new);
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180.builder().setCommentMarker('#')
                .setHeaderComments((Object[]) lines).setHeader(header).get())) {
            for (JsonNode point : results.path("points")) {
                for (ResultFigures.Column c : ResultFigures.POINT_COLUMNS) {
                    JsonNode v = point.get(c.field());
                    csv.print(v == null || v.isNull() ? "" : inert(v.asText()));
                }
                csv.println();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** The cell's text, with a leading apostrophe when a spreadsheet would read it as a formula. */
    static String inert(String text) {
        if (text.isEmpty() || FORMULA_START.indexOf(text.charAt(0)) < 0 || NUMBER.matcher(text).matches()) {
            return text;
        }
        return "'" + text;
    }
}
