package coilwright.thermal;

/**
 * A winding temperature consistent with its own losses.
 *
 * @param windingMeanC  the fixed point: mean winding temperature whose losses heat the winding to itself, C
 *                      ({@link WindingTemperature#MAX_WINDING_C} when {@code settled} is false)
 * @param solution      the network's temperatures at that point
 * @param heat          the heat at that winding temperature
 * @param settled       false when no steady state exists below {@link WindingTemperature#MAX_WINDING_C}: the
 *                      winding would keep heating (thermal runaway or a hopeless overload)
 * @param evaluations   how many times the losses were evaluated
 */
public record CoupledTemperature(double windingMeanC, ThermalSolution solution, HeatSources heat, boolean settled,
                                 int evaluations) {
}
