package coilwright.losses;

/**
 * Rolling-bearing types with the constant coefficient of friction mu of the SKF simplified friction model,
 * M = 0.5 mu P d (SKF General Catalogue, section "Friction", table of mu for unsealed bearings under normal
 * operating conditions; values from memory of that table).
 */
public enum BearingType {
    DEEP_GROOVE_BALL(0.0015),
    SELF_ALIGNING_BALL(0.0010),
    ANGULAR_CONTACT_BALL(0.0020),
    CYLINDRICAL_ROLLER(0.0011),
    TAPERED_ROLLER(0.0018),
    SPHERICAL_ROLLER(0.0018),
    THRUST_BALL(0.0013);

    private final double frictionCoefficient;

    BearingType(double frictionCoefficient) {
        this.frictionCoefficient = frictionCoefficient;
    }

    /** The constant coefficient of friction mu. */
    public double frictionCoefficient() {
        return frictionCoefficient;
    }
}
