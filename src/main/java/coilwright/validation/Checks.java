package coilwright.validation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Collects every invalid field of one input record, then throws them all at once.
 * Use in a record's compact constructor:
 * <pre>{@code
 * Checks c = new Checks();
 * c.positive("airGapM", airGapM);
 * c.range("poleArcRatio", poleArcRatio, 0.3, 1.0);
 * c.throwIfAny();
 * }</pre>
 * Every check also refuses NaN and infinite values.
 */
public final class Checks {
    private final List<FieldError> errors = new ArrayList<>();

    /** value > 0 and finite. */
    public Checks positive(String field, double value) {
        if (finite(field, value, "> 0") && !(value > 0)) {
            fail(field, value, "must be > 0", "> 0");
        }
        return this;
    }

    /** value >= 0 and finite. */
    public Checks nonNegative(String field, double value) {
        if (finite(field, value, ">= 0") && !(value >= 0)) {
            fail(field, value, "must be >= 0", ">= 0");
        }
        return this;
    }

    /** min <= value <= max and finite. */
    public Checks range(String field, double value, double min, double max) {
        if (value >= min && value <= max) {
            return this; // the common case builds no text: records are validated on every operating point
        }
        String allowed = fmt(min) + " to " + fmt(max);
        if (finite(field, value, allowed)) {
            fail(field, value, "must be between " + fmt(min) + " and " + fmt(max), allowed);
        }
        return this;
    }

    /** min < value <= max and finite. */
    public Checks rangeExclusiveMin(String field, double value, double min, double max) {
        if (value > min && value <= max) {
            return this;
        }
        String allowed = "> " + fmt(min) + " and <= " + fmt(max);
        if (finite(field, value, allowed)) {
            fail(field, value, "must be " + allowed, allowed);
        }
        return this;
    }

    /** min <= value <= max for whole numbers. */
    public Checks intRange(String field, long value, long min, long max) {
        if (value < min || value > max) {
            String allowed = min + " to " + max;
            errors.add(new FieldError(field, Long.toString(value),
                    field + " = " + value + ": must be between " + min + " and " + max, allowed));
        }
        return this;
    }

    /** A non-null required value. */
    public Checks present(String field, Object value) {
        if (value == null) {
            errors.add(new FieldError(field, "missing", field + " is missing: a value is required", "a value"));
        }
        return this;
    }

    /** A free-form rule: when {@code ok} is false, records {@code field = value: message}. */
    public Checks require(boolean ok, String field, Object value, String message, String allowed) {
        if (!ok) {
            errors.add(new FieldError(field, String.valueOf(value), field + " = " + text(value) + ": " + message, allowed));
        }
        return this;
    }

    /** Adds errors found by a nested record, placed under {@code prefix}. */
    public Checks nested(String prefix, InvalidInputException e) {
        errors.addAll(e.under(prefix).errors());
        return this;
    }

    public boolean hasErrors() {
        return !errors.isEmpty();
    }

    public List<FieldError> errors() {
        return List.copyOf(errors);
    }

    /** @throws InvalidInputException listing every error collected, if any */
    public void throwIfAny() {
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
    }

    private boolean finite(String field, double value, String allowed) {
        if (Double.isFinite(value)) {
            return true;
        }
        fail(field, value, "must be a finite number", allowed);
        return false;
    }

    private void fail(String field, double value, String message, String allowed) {
        errors.add(new FieldError(field, fmt(value), field + " = " + fmt(value) + ": " + message, allowed));
    }

    private static String text(Object value) {
        return value instanceof Double d ? fmt(d) : String.valueOf(value);
    }

    /** Shortest plain text for a number: 1.0E-4 stays readable, NaN stays NaN. */
    public static String fmt(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        return Double.toString(v);
    }
}
