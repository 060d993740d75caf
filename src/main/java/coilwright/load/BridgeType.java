package coilwright.load;

/** Diode bridge topology: six diodes for a three-phase source, four for a single-phase one. */
public enum BridgeType {
    THREE_PHASE_BRIDGE,
    SINGLE_PHASE_BRIDGE
}
