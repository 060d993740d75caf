package coilwright.web;

/**
 * One figure of a page's summary block ({@code fragments/results :: summary}).
 *
 * @param id     stable element id (tests, print, links)
 * @param label  what it is
 * @param value  the formatted value with its unit
 * @param note   how it was found or what it is measured against, may be empty
 * @param status "ok", "warn", "bad" or "" for a figure that has no limit
 */
public record Figure(String id, String label, String value, String note, String status) {
    /** A figure without a limit. */
    public static Figure of(String id, String label, String value, String note) {
        return new Figure(id, label, value, note, "");
    }
}
