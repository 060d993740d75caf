package coilwright.magnet;

/** Where the magnet rotor of a radial-flux machine sits relative to the stator. */
public enum RotorSide {
    /** Rotor inside a slotted stator bore. */
    INNER,
    /** Rotor ring outside the stator (hub-motor style). */
    OUTER
}
