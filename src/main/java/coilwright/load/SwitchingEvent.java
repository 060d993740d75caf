package coilwright.load;

/** The kinds of diode switching event that end a conduction state of the bridge (see {@link SymmetryIntervalTrace}). */
enum SwitchingEvent {
    /** A conducting diode's current falls to zero and it blocks. */
    CURRENT_ENDS,
    /** A blocked branch becomes forward-biased against the upper rail and its upper diode starts to conduct. */
    JOINS_UPPER_RAIL,
    /** A blocked branch becomes forward-biased against the lower rail and its lower diode starts to conduct. */
    JOINS_LOWER_RAIL,
    /** With no diode conducting, a branch pair's EMF difference reaches the threshold: the pair starts from zero. */
    PAIR_STARTS
}
