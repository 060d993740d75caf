package coilwright.web;

import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Error messages by dotted field path, for showing beside each form field:
 * {@code th:if="${form.errors.has('rotor.airGapM')}" th:text="${form.errors.first('rotor.airGapM')}"}.
 */
public final class FieldErrors {
    private static final FieldErrors NONE = new FieldErrors(Map.of());
    private final Map<String, List<String>> byField;

    private FieldErrors(Map<String, List<String>> byField) {
        this.byField = byField;
    }

    public static FieldErrors none() {
        return NONE;
    }

    public static FieldErrors of(List<FieldError> errors) {
        Map<String, List<String>> map = new LinkedHashMap<>();
        errors.forEach(e -> map.computeIfAbsent(e.field(), k -> new ArrayList<>()).add(e.message()));
        map.replaceAll((k, v) -> List.copyOf(v));
        return new FieldErrors(Collections.unmodifiableMap(map));
    }

    public static FieldErrors of(InvalidInputException e) {
        return of(e.errors());
    }

    /** An infeasible design shown beside its responsible field (or as a form-level error when it has none). */
    public static FieldErrors of(InfeasibleDesignException e) {
        return of(List.of(new FieldError(e.field(), "", e.getMessage(), "")));
    }

    public boolean has(String field) {
        return byField.containsKey(field);
    }

    public List<String> messages(String field) {
        return byField.getOrDefault(field, List.of());
    }

    /** The first message for the field, or an empty string. */
    public String first(String field) {
        List<String> m = messages(field);
        return m.isEmpty() ? "" : m.get(0);
    }

    public boolean isEmpty() {
        return byField.isEmpty();
    }

    /** Every message in field order (for an error summary at the top of a form). */
    public List<String> all() {
        return byField.values().stream().flatMap(List::stream).toList();
    }

    public Map<String, List<String>> asMap() {
        return byField;
    }
}
