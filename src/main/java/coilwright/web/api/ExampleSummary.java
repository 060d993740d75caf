package coilwright.web.api;

/**
 * One example design in the list.
 *
 * @param slug  its stable name, the file name without {@code .json}
 * @param title a short name
 * @param notes what it is
 * @param href  where the whole design document is
 */
public record ExampleSummary(String slug, String title, String notes, String href) {
}
