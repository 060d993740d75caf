package coilwright.turbine;

/**
 * One wind-speed bin of the IEC 61400-12-1 annual energy sum.
 *
 * @param windSpeedFromMs  lower bin edge, m/s
 * @param windSpeedToMs    upper bin edge, m/s
 * @param probability      F(to) - F(from): the share of the year in this bin
 * @param meanPowerW       (P(from) + P(to)) / 2, the trapezoid power of the bin, W
 * @param energyKWh        the bin's contribution to the annual energy, kWh per year
 */
public record EnergyBin(double windSpeedFromMs, double windSpeedToMs, double probability, double meanPowerW,
                        double energyKWh) {
}
