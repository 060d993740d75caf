package coilwright.web.saved;

import coilwright.web.Json;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

import java.io.StringReader;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class CurvesCsvTest {
    @Test
    void cells_a_spreadsheet_would_run_as_formulas_get_a_leading_apostrophe() {
        // source: OWASP "CSV Injection" (cells starting with = + - @, tab or carriage return)
        assertEquals("'=HYPERLINK(\"http://x\",\"y\")", CurvesCsv.inert("=HYPERLINK(\"http://x\",\"y\")"));
        assertEquals("'+SUM(A1:A9)", CurvesCsv.inert("+SUM(A1:A9)"));
        assertEquals("'-2+3+cmd|' /C calc'!A0", CurvesCsv.inert("-2+3+cmd|' /C calc'!A0"));
        assertEquals("'@SUM(1)", CurvesCsv.inert("@SUM(1)"));
        assertEquals("'\t=1", CurvesCsv.inert("\t=1"));
        assertEquals("'\r=1", CurvesCsv.inert("\r=1"));
    }

    @Test
    void numbers_and_ordinary_text_are_left_as_they_are() {
        for (String same : List.of("-1.5E-4", "-0.25", "+3", "12", "1e9", "-.5", "", "CONDUCTING", "a=b")) {
            assertEquals(same, CurvesCsv.inert(same));
        }
    }

    @Test
    void a_snapshot_holding_a_formula_exports_it_as_text() throws Exception {
        String snapshot = "{\"points\":[{\"speedRpm\":\"=1+1\",\"frequencyHz\":-12.5,\"powerToLoadW\":\"@evil\"}]}";
        String csv = CurvesCsv.of(Json.mapper().readTree(snapshot));
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv)).getRecords();
        assertEquals("'=1+1", rows.get(0).get("Speed (rpm)"));
        assertEquals("-12.5", rows.get(0).get("Frequency (Hz)"));
        assertEquals("'@evil", rows.get(0).get("Power to load (W)"));
    }
}
