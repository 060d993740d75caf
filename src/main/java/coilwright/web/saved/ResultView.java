package coilwright.web.saved;

import coilwright.web.Words;
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
                boolean fraction = f.unit().equals(FRACTION);
                summary.add(new Row(f.label(), fraction && n.isNumber() ? ResultFigures.format(100 * n.doubleValue())
                        : ResultFigures.format(n), shownUnit(f.unit())));
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
            rows.add(columns.stream().map(c -> cell(c, p.get(c.field()))).toList());
        }
        return new ResultView(summary, cautions, warnings, columns.stream().map(ResultView::heading).toList(), rows);
    }

    /** The unit of a dimensionless fraction in the snapshot's figures: pages show it as a percentage. */
    private static final String FRACTION = "1";

    private static String cell(ResultFigures.Column c, JsonNode n) {
        if (n != null && n.isNumber() && c.unit().equals(FRACTION)) {
            return ResultFigures.format(100 * n.doubleValue());
        }
        return n != null && n.isTextual() ? Words.of(n.asText()) : ResultFigures.format(n);
    }

    private static String heading(ResultFigures.Column c) {
        return c.unit().isEmpty() ? c.heading() : c.heading() + " (" + shownUnit(c.unit()) + ")";
    }

    /** A snapshot's ASCII unit as a page shows it: "N·m", "A/mm²", "Ω", "%" for a fraction. */
    static String shownUnit(String unit) {
        return switch (unit) {
            case FRACTION -> "%";
            case "ohm" -> "Ω";
            default -> Words.inText(unit);
        };
    }
}
