package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * What an annual-energy figure assumes beyond the power curve, with the reason for each default, so a page can list
 * them.
 *
 * @param drivetrainEfficiency  rotor shaft to alternator shaft, 0.5 to 1
 * @param drivetrainBasis       why that value
 * @param availability          share of the year the turbine is able to run, 0.5 to 1
 * @param availabilityBasis     why that value
 */
public record EnergyAssumptions(double drivetrainEfficiency, String drivetrainBasis, double availability,
                                String availabilityBasis) {
    /** Belt or gear drive efficiency (common practice: V-belts and single-stage gears 0.93 to 0.98). */
    public static final double GEARED_DRIVETRAIN_EFFICIENCY = 0.95;
    /** Availability of a small off-grid turbine (common practice: 0.90 to 0.98). */
    public static final double DEFAULT_AVAILABILITY = 0.95;

    public EnergyAssumptions {
        new Checks().range("drivetrainEfficiency", drivetrainEfficiency, 0.5, 1).range("availability", availability, 0.5, 1)
                .throwIfAny();
        drivetrainBasis = drivetrainBasis == null ? "" : drivetrainBasis;
        availabilityBasis = availabilityBasis == null ? "" : availabilityBasis;
    }

    /**
     * Defaults for a drive: a belt or gear drive {@link #GEARED_DRIVETRAIN_EFFICIENCY}; direct drive 1, because
     * there is no transmission and the bearings' friction is counted in the alternator's own losses (counting it
     * again here would double it). Availability {@link #DEFAULT_AVAILABILITY}: the IEC 61400-12-1 method gives the
     * energy at 100 % availability, and small turbines lose days to faults, icing, storms (furled or braked) and
     * maintenance.
     *
     * @param driveRatio alternator speed / rotor speed (1 for direct drive)
     */
    public static EnergyAssumptions defaults(double driveRatio) {
        new Checks().rangeExclusiveMin("driveRatio", driveRatio, 0, 50).throwIfAny();
        boolean direct = driveRatio == 1.0;
        return new EnergyAssumptions(direct ? 1.0 : GEARED_DRIVETRAIN_EFFICIENCY,
                direct ? "direct drive: no transmission; bearing friction and windage are counted in the alternator's "
                        + "losses" : "belt or gear drive: 0.93 to 0.98 per stage (common practice)",
                DEFAULT_AVAILABILITY, "IEC 61400-12-1 reports energy at 100 % availability; small turbines lose some "
                        + "days to faults, icing, storms and maintenance (0.90 to 0.98, common practice)");
    }

    /** Annual energy after availability, from the energy the power curve gives at 100 % availability, kWh. */
    public double deliveredKWh(double energyAtFullAvailabilityKWh) {
        new Checks().nonNegative("energyAtFullAvailabilityKWh", energyAtFullAvailabilityKWh).throwIfAny();
        return energyAtFullAvailabilityKWh * availability;
    }
}
