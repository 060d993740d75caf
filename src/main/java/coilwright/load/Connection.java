package coilwright.load;

/** How a three-phase winding's phases are joined: star (wye) or delta. */
public enum Connection {
    STAR,
    DELTA
}
