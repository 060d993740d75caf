package coilwright.machine;

/** How the phases of a three-phase winding are joined. A single-phase winding is always STAR (one phase, two ends). */
public enum Connection {
    /** Line voltage = sqrt(3) x phase voltage; line current = phase current. */
    STAR,
    /** Line voltage = phase voltage; line current = sqrt(3) x phase current. */
    DELTA
}
