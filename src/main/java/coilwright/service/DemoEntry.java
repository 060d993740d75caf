package coilwright.service;

import coilwright.store.DemoDesign;

/**
 * A demo design loaded from the examples: the only saved designs that are listed.
 *
 * @param slug             the example's stable name (its file name without extension)
 * @param designId         its permanent design id, the same on every start
 * @param latestRevisionId its latest revision
 * @param title            the latest revision's title
 */
public record DemoEntry(String slug, String designId, String latestRevisionId, String title) {
    static DemoEntry of(DemoDesign d) {
        return new DemoEntry(d.slug(), d.designId(), d.latestRevisionId(), d.title());
    }
}
