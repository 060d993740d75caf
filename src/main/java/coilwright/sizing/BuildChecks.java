package coilwright.sizing;

import coilwright.validation.Checks;

import java.util.List;

/** Checks shared by the build records. */
final class BuildChecks {
    private BuildChecks() {
    }

    static void poles(Checks c, int minPoles, int maxPoles, int lowest) {
        c.intRange("minPoles", minPoles, lowest, 400).intRange("maxPoles", maxPoles, lowest, 400);
        c.require(minPoles % 2 == 0, "minPoles", minPoles, "must be even", "even");
        c.require(maxPoles % 2 == 0, "maxPoles", maxPoles, "must be even", "even");
        c.require(maxPoles >= minPoles, "maxPoles", maxPoles, "must be at least minPoles = " + minPoles, ">= minPoles");
    }

    /** Records an error for each missing entry; true when there is none. */
    static boolean entriesPresent(Checks c, String field, List<?> values) {
        boolean ok = true;
        for (int i = 0; values != null && i < values.size(); i++) {
            if (values.get(i) == null) {
                c.present(field + "[" + i + "]", null);
                ok = false;
            }
        }
        return ok;
    }

    static void list(Checks c, String field, List<Double> values, int maxEntries, double min, double max) {
        c.intRange(field + ".size", values.size(), 1, maxEntries);
        for (int i = 0; i < values.size(); i++) {
            c.range(field + "[" + i + "]", values.get(i), min, max);
        }
        c.require(values.stream().distinct().count() == values.size(), field, values, "must not repeat a value",
                "distinct values");
    }
}
