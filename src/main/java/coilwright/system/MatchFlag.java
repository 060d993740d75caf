package coilwright.system;

/** What stands out about a matched operating point. */
public enum MatchFlag {
    /** The alternator takes no torque (below cut-in): the rotor spins freely at its runaway tip-speed ratio. */
    FREE_SPINNING,
    /**
     * The alternator holds the rotor far below its best tip-speed ratio, below {@link WindMatcher#STALL_TSR_SHARE}
     * of the optimum: the blades run stalled and most of the wind's power is lost.
     */
    STALL,
    /** The equilibrium speed lies above the rotor's maximum speed: the furling or governor must act. */
    OVER_SPEED,
    /** The runner or rotor runs above its best speed, towards runaway (hydro: above 1.2 x the optimum). */
    ABOVE_OPTIMUM
}
