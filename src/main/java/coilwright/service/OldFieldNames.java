package coilwright.service;

import coilwright.machine.AirCoredStator;
import coilwright.machine.AlternatorSpec;
import coilwright.magnet.AxialDualRotor;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

/**
 * Input names that were replaced, and the rewriting that lets a document using them bind for ever. Saved designs are
 * immutable revisions behind permanent links, so a design stored under the old names must open, recompute and
 * compare with every later version: the old names are accepted everywhere a design is read (request bodies, uploaded
 * files, stored inputs and snapshots, example files), never only for one release.
 * <p>
 * API version 1.1 renamed the axial-flux geometry:
 * <ul>
 *   <li>{@code AxialDualRotor}: {@code statorThicknessM} is now {@code coilLayerThicknessM} and
 *       {@code runningClearanceM} is now {@code clearancePerSideM} (same meaning, same values);</li>
 *   <li>{@code AirCoredStator}: {@code coilLegWidthM} is now {@code conductorBandWidthM} (same meaning), and the
 *       opening is described by its width halfway along and its taper instead of its two end widths:
 *       {@code openingMidWidthM = (coilHoleInnerWidthM + coilHoleOuterWidthM) / 2},
 *       {@code openingTaperM = coilHoleOuterWidthM - coilHoleInnerWidthM}. The mean turn computed from the
 *       converted values is the same to the last bit.</li>
 * </ul>
 * API version 1.2 added {@code AlternatorSpec.ambientTempC}: a document written before it (saved designs, example
 * files, request bodies that leave it out) reads as {@link AlternatorSpec#DEFAULT_AMBIENT_TEMP_C}, the ambient every
 * earlier result assumed, so old revisions recompute to the figures they showed. This is a default, not a rename:
 * it is not reported as a deprecated name.
 * <p>
 * An object is only rewritten where the new names are absent; a document mixing old and new names for the same
 * thing keeps its old name, which the binder then reports as an unknown field.
 */
public final class OldFieldNames {
    private static final List<List<String>> ROTOR = List.of(List.of("statorThicknessM", "coilLayerThicknessM"),
            List.of("runningClearanceM", "clearancePerSideM"));

    /**
     * One rewriting applied to a document.
     *
     * @param path     dotted path of the object rewritten ({@code design.alternator.rotor}), empty for the root
     * @param oldNames the names found, joined by {@code +} when two were combined
     * @param newNames the names now used
     */
    public record Rename(String path, String oldNames, String newNames) {
        /** {@code alternator.rotor.statorThicknessM -> alternator.rotor.coilLayerThicknessM}. */
        public String text() {
            String prefix = path.isEmpty() ? "" : path + ".";
            return prefix + oldNames.replace("+", "+" + prefix) + " -> " + prefix + newNames.replace("+", "+" + prefix);
        }
    }

    private OldFieldNames() {
    }

    /** True for the record types whose JSON had other names before. */
    public static boolean renamed(Class<?> type) {
        return type == AxialDualRotor.class || type == AirCoredStator.class || type == AlternatorSpec.class;
    }

    /** A cheap test before parsing: false when the text cannot hold any old name. */
    public static boolean mayHoldOldNames(String json) {
        return json.contains("statorThicknessM") || json.contains("runningClearanceM") || json.contains("coilLegWidthM")
                || json.contains("coilHoleInnerWidthM") || json.contains("coilHoleOuterWidthM");
    }

    /**
     * Rewrites the old names of one record's object in place.
     *
     * @param type the record the object binds to
     * @return what was rewritten, with an empty path
     */
    public static List<Rename> upgrade(Class<?> type, ObjectNode node) {
        List<Rename> done = new ArrayList<>();
        if (type == AlternatorSpec.class && !node.has("ambientTempC")) {
            node.put("ambientTempC", AlternatorSpec.DEFAULT_AMBIENT_TEMP_C);
        }
        if (type == AxialDualRotor.class) {
            ROTOR.forEach(pair -> rename(node, pair.get(0), pair.get(1), done));
        } else if (type == AirCoredStator.class) {
            rename(node, "coilLegWidthM", "conductorBandWidthM", done);
            JsonNode inner = node.get("coilHoleInnerWidthM");
            JsonNode outer = node.get("coilHoleOuterWidthM");
            if (inner != null && outer != null && inner.isNumber() && outer.isNumber()
                    && !node.has("openingMidWidthM") && !node.has("openingTaperM")) {
                double a = inner.doubleValue();
                double b = outer.doubleValue();
                node.remove("coilHoleInnerWidthM");
                node.remove("coilHoleOuterWidthM");
                node.put("openingMidWidthM", (a + b) / 2);
                node.put("openingTaperM", b - a);
                done.add(new Rename("", "coilHoleInnerWidthM+coilHoleOuterWidthM", "openingMidWidthM+openingTaperM"));
            }
        }
        return done;
    }

    /**
     * Rewrites, in place, every object of the tree whose {@code "type"} names a renamed record (the sealed inputs
     * always carry it, in requests, stored inputs and stored results alike).
     *
     * @return what was rewritten, with dotted paths from the root
     */
    public static List<Rename> upgradeTree(JsonNode root) {
        List<Rename> done = new ArrayList<>();
        walk(root, "", done);
        return done;
    }

    private static void walk(JsonNode node, String path, List<Rename> done) {
        if (node instanceof ObjectNode object) {
            JsonNode type = object.get("type");
            Class<?> record = type == null ? null : switch (type.asText()) {
                case "AxialDualRotor" -> AxialDualRotor.class;
                case "AirCoredStator" -> AirCoredStator.class;
                default -> null;
            };
            if (record != null) {
                upgrade(record, object).forEach(r -> done.add(new Rename(path, r.oldNames(), r.newNames())));
            }
            if (record == null && (path.equals("alternator") || path.endsWith(".alternator"))
                    && object.has("turnsPerCoil")) {
                upgrade(AlternatorSpec.class, object); // the machine carries no "type": found by its place
            }
            for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                walk(e.getValue(), path.isEmpty() ? e.getKey() : path + "." + e.getKey(), done);
            }
        } else if (node != null && node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                walk(node.get(i), path + "[" + i + "]", done);
            }
        }
    }

    private static void rename(ObjectNode node, String old, String now, List<Rename> done) {
        if (node.has(old) && !node.has(now)) {
            node.set(now, node.remove(old));
            done.add(new Rename("", old, now));
        }
    }
}
