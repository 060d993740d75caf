package coilwright.thermal;

/** Whether the air inside a housed machine is shut in or changes with the outside air. */
public enum Enclosure {
    /** Openings in the end shields let outside air through the end spaces: the internal air is at ambient. */
    OPEN_VENTILATED,
    /** Totally enclosed, no fan: internal air is a separate node that gives its heat to the housing. */
    ENCLOSED
}
