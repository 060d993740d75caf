package coilwright.demag;

/** Outcome of a demagnetisation check. */
public enum Verdict {
    /** Margin at least {@link DemagnetisationCheck#WARNING_MARGIN}. */
    OK,
    /** Within the knee but closer than {@link DemagnetisationCheck#WARNING_MARGIN}. */
    WARNING,
    /** Beyond the knee: the worst-case fault would demagnetise the magnets for good. */
    DANGER
}
