package coilwright.thermal;

/**
 * The thermal network of one cooling arrangement: the losses of an operating point in, steady temperatures out.
 * {@link DiscStatorThermal}: air-cored coils cast in resin between two rotor discs;
 * {@link SlottedStatorThermal}: a slotted iron stator in a housing, open or enclosed.
 */
public sealed interface ThermalModel permits DiscStatorThermal, SlottedStatorThermal {

    /**
     * Steady temperatures for the heat of one operating point. The surface coefficients depend on the surface
     * temperatures (natural convection, radiation); they are iterated to a self-consistent solution.
     *
     * @param conditions speed, ambient temperature and external air speed
     * @param heat       the losses as heat, W
     */
    ThermalSolution solve(CoolingConditions conditions, HeatSources heat);
}
