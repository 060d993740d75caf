package coilwright.turbine;

import java.util.List;

/**
 * Annual energy by the bin method.
 *
 * @param annualEnergyKWh   energy per year, kWh
 * @param dailyEnergyKWh    the same per day (annual / 365), kWh
 * @param meanPowerW        the year-round mean power, W
 * @param ratedPowerW       the rated power the capacity factor refers to, W
 * @param capacityFactor    annual energy / (rated power x 8760 h), 0 to 1 for a power curve within rating
 * @param hoursPerYear      the hours in the year used, 8760
 * @param bins              every bin from 0 to the top wind speed
 */
public record AnnualEnergyResult(double annualEnergyKWh, double dailyEnergyKWh, double meanPowerW,
                                 double ratedPowerW, double capacityFactor, double hoursPerYear,
                                 List<EnergyBin> bins) {
    public AnnualEnergyResult {
        bins = List.copyOf(bins);
    }
}
