package coilwright.load;

/** How current flows at one operating point. */
public enum ConductionMode {
    /** The peak EMF does not exceed battery plus two diode drops: no current at all. */
    ZERO_BELOW_CUT_IN,
    /** Every line current returns to zero each cycle (pulses with gaps where no diode conducts). */
    DISCONTINUOUS,
    /** Single-phase bridge whose line current reverses without a gap (no overlap exists with four diodes). */
    CONTINUOUS,
    /** Three-phase bridge whose DC current never stops; commutations overlap (three diodes at a time). */
    CONTINUOUS_WITH_OVERLAP,
    /** Resistive load: sinusoidal steady state, no rectifier. */
    SINUSOIDAL_RESISTIVE
}
