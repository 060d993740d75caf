package coilwright.load;

/** The battery voltage a charger works against: nominal (resting), absorption (bulk end) or float. */
public enum ChargeStage {
    NOMINAL,
    ABSORB,
    FLOAT
}
