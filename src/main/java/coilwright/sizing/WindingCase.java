package coilwright.sizing;

/** A layout with one of its parallel-path counts: the outer unit of the search space. */
record WindingCase(Layout layout, int paths) {
}
