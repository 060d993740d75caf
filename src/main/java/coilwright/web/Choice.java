package coilwright.web;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * One option of a select ({@code fragments/forms :: select}): the value sent and the label shown.
 *
 * @param value what the form posts
 * @param label what the user reads
 */
public record Choice(String value, String label) {
    /** The coil sides per slot in words (the values are the {@code Layers} names). */
    public static final List<Choice> LAYERS = List.of(new Choice("DOUBLE", "Two (double layer)"),
            new Choice("SINGLE", "One (single layer)"));

    /** Options whose label is their value, e.g. enum names. */
    public static List<Choice> of(List<String> values) {
        return values.stream().map(v -> new Choice(v, v)).toList();
    }

    /** Options whose label is their value. */
    public static List<Choice> of(String... values) {
        return of(List.of(values));
    }

    /** An enum's values as options: the name is posted, the trade's word for it shown ({@link Words}). */
    public static List<Choice> names(Enum<?>[] constants) {
        return Arrays.stream(constants).map(c -> new Choice(c.name(), Words.of(c))).toList();
    }

    /** Enum names as options, each shown in the trade's words ({@link Words}). */
    public static List<Choice> words(String... names) {
        return Arrays.stream(names).map(n -> new Choice(n, Words.of(n))).toList();
    }

    /** Value to label, in the map's order. */
    public static List<Choice> labelled(Map<String, String> labels) {
        return labels.entrySet().stream().map(e -> new Choice(e.getKey(), e.getValue())).toList();
    }
}
