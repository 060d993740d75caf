package coilwright.web.saved;

import coilwright.service.DesignLibrary;
import coilwright.service.TreeDiff;
import coilwright.service.SavedRevision;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Two saved revisions side by side: the input fields that differ (title and notes included) and the key results
 * of each snapshot, each marked when they differ.
 *
 * @param a               the first revision
 * @param b               the second revision
 * @param inputDifferences input leaves that differ, with paths such as {@code design.alternator.turnsPerCoil}
 * @param results         key results of both snapshots
 */
record Comparison(Side a, Side b, List<TreeDiff.Difference> inputDifferences, List<FigurePair> results) {
    /** Numbers in two snapshots are "the same" within this relative tolerance. */
    static final double TOLERANCE = DesignLibrary.RECOMPUTE_TOLERANCE;

    record Side(String designId, String revisionId, int number, String title, String toolVersion, String link) {
        static Side of(SavedRevision r) {
            return new Side(r.designId(), r.revisionId(), r.number(), r.title(), r.toolVersion(),
                    "/d/" + r.designId() + "/r/" + r.revisionId());
        }
    }

    /** One key result of each side; a side without the figure has {@code null}. */
    record FigurePair(String key, String label, String unit, Double a, Double b, boolean differs) {
        /** Pages show a fraction ("1") as a percentage. */
        private double scale() {
            return unit.equals("1") ? 100 : 1;
        }

        public String shownUnit() {
            return ResultView.shownUnit(unit);
        }

        public String aText() {
            return a == null ? "—" : ResultFigures.format(scale() * a);
        }

        public String bText() {
            return b == null ? "—" : ResultFigures.format(scale() * b);
        }

        /** Second minus first, in the shown unit, signed; a dash when either is missing. */
        public String differenceText() {
            if (a == null || b == null) {
                return "—";
            }
            double d = scale() * (b - a);
            return d == 0 ? "0" : (d > 0 ? "+" : "") + ResultFigures.format(d);
        }

        /** The change relative to the first, signed, in %; a dash when the first is missing or zero. */
        public String changeText() {
            if (a == null || b == null || a == 0) {
                return "—";
            }
            return String.format(java.util.Locale.ROOT, "%+.1f %%", 100 * (b - a) / Math.abs(a));
        }
    }

    static Comparison of(DesignLibrary library, SavedRevision ra, SavedRevision rb) {
        JsonNode ia = inputOf(library, ra);
        JsonNode ib = inputOf(library, rb);
        JsonNode sa = library.tree(ra.resultJson());
        JsonNode sb = library.tree(rb.resultJson());
        List<FigurePair> figures = new ArrayList<>();
        for (ResultFigures.Figure f : ResultFigures.KEY) {
            Optional<Double> x = f.in(sa);
            Optional<Double> y = f.in(sb);
            boolean differs = x.isPresent() != y.isPresent() || x.isPresent()
                    && TreeDiff.differences(sa.at(f.pointer()), sb.at(f.pointer()), TOLERANCE).size() > 0;
            figures.add(new FigurePair(f.key(), f.label(), f.unit(), x.orElse(null), y.orElse(null), differs));
        }
        return new Comparison(Side.of(ra), Side.of(rb), TreeDiff.differences(ia, ib, 0), figures);
    }

    /** Title, notes and design input as one tree, so a changed title shows as a difference too. */
    private static JsonNode inputOf(DesignLibrary library, SavedRevision r) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("title", r.title());
        node.put("notes", r.notes());
        node.set("design", library.tree(r.inputJson()));
        return node;
    }

    /** True when anything in the input or the key results differs. */
    public boolean anyDifference() {
        return !inputDifferences.isEmpty() || results.stream().anyMatch(FigurePair::differs);
    }
}
