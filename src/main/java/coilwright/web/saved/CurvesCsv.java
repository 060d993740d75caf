package coilwright.web.saved;

import com.fasterxml.jackson.databind.JsonNode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;

/**
 * Every operating point of a results snapshot as CSV (RFC 4180: comma separated, CRLF line ends, quoted where
 * needed), one row per speed, a header naming each column with its unit, e.g. {@code Power to load (W)}. Numbers are
 * written as saved, at full precision; a field the snapshot lacks is an empty cell.
 */
final class CurvesCsv {
    private CurvesCsv() {
    }

    static String of(JsonNode results) {
        StringWriter out = new StringWriter();
        String[] header = ResultFigures.POINT_COLUMNS.stream().map(ResultFigures.Column::header).toArray(String[]::new);
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(header).get())) {
            for (JsonNode point : results.path("points")) {
                for (ResultFigures.Column c : ResultFigures.POINT_COLUMNS) {
                    JsonNode v = point.get(c.field());
                    csv.print(v == null || v.isNull() ? "" : v.asText());
                }
                csv.println();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }
}
