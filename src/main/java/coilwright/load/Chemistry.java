package coilwright.load;

/** Battery chemistry; {@link #CUSTOM} means the user states the bank voltage directly. */
public enum Chemistry {
    LEAD_ACID,
    LIFEPO4,
    CUSTOM
}
