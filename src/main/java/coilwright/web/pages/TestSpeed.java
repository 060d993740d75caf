package coilwright.web.pages;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

/** The bench sheet's test speed: a speed in rpm from the query, 1 to 100 000, or the design's rated speed. */
final class TestSpeed {
    static final double MAX_RPM = 100_000;

    private TestSpeed() {
    }

    /** @throws InvalidInputException naming {@code testRpm} when the text is not a speed in range */
    static double parse(String text, double fallbackRpm) {
        if (text == null || text.isBlank()) {
            return fallbackRpm;
        }
        double rpm;
        try {
            rpm = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            rpm = Double.NaN;
        }
        if (!(rpm >= 1 && rpm <= MAX_RPM)) {
            throw new InvalidInputException(new FieldError("testRpm", text, "testRpm = " + text
                    + ": must be a speed from 1 to 100000 rpm", "1 to 100000"));
        }
        return rpm;
    }
}
