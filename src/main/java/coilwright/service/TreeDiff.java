package coilwright.service;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Leaf-by-leaf comparison of two JSON trees, with paths written as {@code load.battery.cells} and
 * {@code points[3].speedRpm}. Numbers are equal when they agree within a relative tolerance.
 */
public final class TreeDiff {
    /** Marks a leaf that one side does not have. */
    public static final String ABSENT = "(absent)";

    /**
     * One leaf that differs.
     *
     * @param path dotted path of the leaf
     * @param a    its text on the first side, or {@link #ABSENT}
     * @param b    its text on the second side, or {@link #ABSENT}
     */
    public record Difference(String path, String a, String b) {
    }

    private TreeDiff() {
    }

    /** Every leaf of {@code root} by path, in document order. Empty objects and arrays count as leaves. */
    public static Map<String, JsonNode> leaves(JsonNode root) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        collect(root, "", out);
        return out;
    }

    /** Every leaf that differs, including leaves present on one side only; numbers compared within {@code relTol}. */
    public static List<Difference> differences(JsonNode a, JsonNode b, double relTol) {
        Map<String, JsonNode> la = leaves(a);
        Map<String, JsonNode> lb = leaves(b);
        Set<String> paths = new LinkedHashSet<>(la.keySet());
        paths.addAll(lb.keySet());
        List<Difference> out = new ArrayList<>();
        for (String p : paths) {
            JsonNode x = la.get(p);
            JsonNode y = lb.get(p);
            if (x == null || y == null || !same(x, y, relTol)) {
                out.add(new Difference(p, text(x), text(y)));
            }
        }
        return out;
    }

    /**
     * The numbers of {@code saved} that {@code recomputed} no longer reproduces: missing, no longer a number, or
     * different by more than {@code relTol}. Leaves that only {@code recomputed} has (new outputs) do not count.
     */
    public static List<Difference> numericChanges(JsonNode saved, JsonNode recomputed, double relTol) {
        Map<String, JsonNode> now = leaves(recomputed);
        List<Difference> out = new ArrayList<>();
        for (Map.Entry<String, JsonNode> e : leaves(saved).entrySet()) {
            if (!e.getValue().isNumber()) {
                continue;
            }
            JsonNode y = now.get(e.getKey());
            if (y == null || !same(e.getValue(), y, relTol)) {
                out.add(new Difference(e.getKey(), text(e.getValue()), text(y)));
            }
        }
        return out;
    }

    /** True when both are numbers within {@code relTol} of each other (relative to the larger magnitude), or equal. */
    static boolean same(JsonNode x, JsonNode y, double relTol) {
        if (x.isNumber() && y.isNumber()) {
            double u = x.doubleValue();
            double v = y.doubleValue();
            return u == v || Math.abs(u - v) <= relTol * Math.max(Math.abs(u), Math.abs(v));
        }
        return x.equals(y);
    }

    private static String text(JsonNode n) {
        if (n == null) {
            return ABSENT;
        }
        return n.isValueNode() ? n.asText() : n.toString();
    }

    private static void collect(JsonNode node, String path, Map<String, JsonNode> out) {
        if (node.isObject() && node.size() > 0) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                collect(e.getValue(), path.isEmpty() ? e.getKey() : path + "." + e.getKey(), out);
            }
        } else if (node.isArray() && node.size() > 0) {
            for (int i = 0; i < node.size(); i++) {
                collect(node.get(i), path + "[" + i + "]", out);
            }
        } else {
            out.put(path, node);
        }
    }
}
