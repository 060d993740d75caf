package coilwright.store;

/**
 * A demo design loaded from the examples: the only designs that may be listed.
 *
 * @param slug             the example's stable name (e.g. its file name without extension)
 * @param designId         its permanent design id
 * @param latestRevisionId its latest revision
 * @param title            the latest revision's title
 */
public record DemoDesign(String slug, String designId, String latestRevisionId, String title) {
}
