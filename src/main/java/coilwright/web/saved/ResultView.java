package coilwright.web.saved;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;

/**
 * A results snapshot ready for a page: key figures, cautions, warnings and the operating-point table, all as text.
 * Built from the JSON tree, so it shows what the snapshot holds whatever tool version wrote it.
 */
record ResultView(List<Row> summary, List<CautionRow> cautions, List<String> warnings, List<String> headings,
                  List<List<String>> rows) {

    record Row(String label, String value, String unit) {
    }

    record CautionRow(String severity, String title, String message, String reference) {
    }

    static ResultView of(JsonNode results) {
        List<Row> summary = new ArrayList<>();
        for (ResultFigures.Figure f : ResultFigures.KEY) {
            JsonNode n = results.at(f.pointer());
            if (!n.isMissingNode()) {
                summary.add(new Row(f.label(), ResultFigures.format(n), f.unit()));
            }
        }
        List<CautionRow> cautions = new ArrayList<>();
        for (JsonNode c : results.path("cautions")) {
            cautions.add(new CautionRow(c.path("severity").asText(), c.path("title").asText(), c.path("message").asText(),
                    c.path("reference").asText()));
        }
        List<String> warnings = new ArrayList<>();
        results.path("warnings").forEach(w -> warnings.add(w.asText()));
        List<ResultFigures.Column> columns = ResultFigures.POINT_COLUMNS.stream()
                .filter(c -> ResultFigures.PAGE_COLUMNS.contains(c.field())).toList();
        List<List<String>> rows = new ArrayList<>();
        for (JsonNode p : results.path("points")) {
            rows.add(columns.stream().map(c -> ResultFigures.format(p.get(c.field()))).toList());
        }
        return new ResultView(summary, cautions, warnings, columns.stream().map(ResultFigures.Column::header).toList(), rows);
    }
}
