package coilwright.web.saved;

import com.fasterxml.jackson.databind.JsonNode;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Optional;

/**
 * Where the figures shown for a saved design sit in a results snapshot, with their labels and units. Snapshots are
 * read as JSON trees, not as result records, so a snapshot from an older tool version still shows whatever it holds.
 */
final class ResultFigures {
    /** One figure: a JSON pointer into the snapshot, a label and its unit. */
    record Figure(String key, String pointer, String label, String unit) {
        Optional<Double> in(JsonNode results) {
            JsonNode n = results.at(pointer);
            return n.isNumber() ? Optional.of(n.doubleValue()) : Optional.empty();
        }
    }

    /** One column of the operating-point table: the field of a point, its heading and unit (ASCII). */
    record Column(String field, String heading, String unit) {
        String header() {
            return unit.isEmpty() ? heading : heading + " (" + unit + ")";
        }
    }

    static final List<Figure> KEY = List.of(
            new Figure("cutInSpeedRpm", "/cutInSpeedRpm", "Cut-in speed", "rpm"),
            new Figure("cutInSpeedSolvedRpm", "/cutInSpeedSolvedRpm", "Cut-in speed on the solved curve", "rpm"),
            new Figure("ratedSpeedRpm", "/rated/speedRpm", "Rated speed", "rpm"),
            new Figure("ratedPowerToLoadW", "/rated/powerToLoadW", "Power to load at rated speed", "W"),
            new Figure("ratedEfficiency", "/rated/efficiency", "Efficiency at rated speed", "1"),
            new Figure("ratedDcCurrentA", "/rated/dcCurrentA", "DC current at rated speed", "A"),
            new Figure("ratedLineCurrentRmsA", "/rated/lineCurrentRmsA", "Line current at rated speed", "A rms"),
            new Figure("ratedShaftTorqueNm", "/rated/shaftTorqueNm", "Shaft torque at rated speed", "N*m"),
            new Figure("ratedCurrentDensityAPerMm2", "/rated/currentDensityAPerMm2", "Current density at rated speed", "A/mm^2"),
            new Figure("openCircuitLineRmsVAtMaxSpeed", "/openCircuitLineRmsVAtMaxSpeed",
                    "Open-circuit line voltage at maximum speed", "V rms"),
            new Figure("maxSpeedRpm", "/maxSpeedRpm", "Maximum speed", "rpm"),
            new Figure("keLineRmsVPerRpm", "/alternator/keLineRmsVPerRpm", "Back-EMF constant, line", "V rms/rpm"),
            new Figure("phaseResistanceHotOhm", "/alternator/resistance/resistanceHotOhm", "Phase resistance, hot", "ohm"),
            new Figure("phaseInductanceH", "/alternator/inductance/phaseInductanceH", "Phase inductance", "H"),
            new Figure("copperMassKg", "/alternator/copperMassKg", "Copper mass", "kg"),
            new Figure("magnetMassKg", "/alternator/magnetMassKg", "Magnet mass", "kg"));

    static final List<Column> POINT_COLUMNS = List.of(
            new Column("speedRpm", "Speed", "rpm"),
            new Column("frequencyHz", "Frequency", "Hz"),
            new Column("emfPhaseRmsV", "Phase EMF", "V rms"),
            new Column("emfLineRmsV", "Line EMF", "V rms"),
            new Column("terminalLineRmsV", "Terminal line voltage", "V rms"),
            new Column("dcVoltageAtRectifierV", "DC voltage at rectifier", "V"),
            new Column("dcCurrentA", "DC current", "A"),
            new Column("phaseCurrentRmsA", "Phase current", "A rms"),
            new Column("lineCurrentRmsA", "Line current", "A rms"),
            new Column("powerToLoadW", "Power to load", "W"),
            new Column("windingCopperLossW", "Winding copper loss", "W"),
            new Column("cableLossW", "Cable loss", "W"),
            new Column("batteryInternalLossW", "Battery internal loss", "W"),
            new Column("diodeLossW", "Diode loss", "W"),
            new Column("shaftPowerW", "Shaft power", "W"),
            new Column("shaftTorqueNm", "Shaft torque", "N*m"),
            new Column("efficiency", "Efficiency", "1"),
            new Column("currentDensityAPerMm2", "Current density", "A/mm^2"),
            new Column("mode", "Conduction mode", ""));

    /** The columns the pages show (the CSV has them all). */
    static final List<String> PAGE_COLUMNS = List.of("speedRpm", "emfLineRmsV", "terminalLineRmsV", "dcCurrentA",
            "powerToLoadW", "shaftTorqueNm", "efficiency", "currentDensityAPerMm2");

    private ResultFigures() {
    }

    /** A number to four significant figures in plain notation; text as it is; a dash when absent. */
    static String format(JsonNode n) {
        if (n == null || n.isMissingNode() || n.isNull()) {
            return "—";
        }
        if (!n.isNumber()) {
            return n.asText();
        }
        return format(n.doubleValue());
    }

    static String format(double v) {
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }
}
