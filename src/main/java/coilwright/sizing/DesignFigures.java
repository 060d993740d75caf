package coilwright.sizing;

import java.util.OptionalDouble;

/**
 * The main numbers of a proposed design under the full model.
 *
 * @param cutInSpeedRpm               alternator speed where charging starts (closed form, exact threshold), rpm
 * @param cutInWindSpeedMs            wind drives: lowest tabulated wind speed that charges, m/s; empty otherwise
 * @param ratedSpeedRpm               alternator speed at the rated point, rpm
 * @param ratedPowerW                 power into the battery at the rated point, W
 * @param ratedEfficiency             battery power over alternator shaft power at the rated point (iron and friction
 *                                    losses not modelled)
 * @param ratedCurrentDensityAPerMm2  rms current density in the winding at the rated point, A/mm^2
 * @param fill                        coil fill: copper fill in slots, wire fill of air-cored coils
 * @param openCircuitLineRmsV         open-circuit line voltage at the highest speed, V rms
 * @param maxSpeedRpm                 that speed, rpm
 * @param copperMassKg                copper of all phases, kg
 * @param magnetMassKg                magnets, kg
 * @param materialCost                copper and magnets at the prices given (0 when none were given)
 * @param annualEnergyKWh             energy into the battery per year, kWh; empty when the drive gives none
 */
public record DesignFigures(double cutInSpeedRpm, OptionalDouble cutInWindSpeedMs, double ratedSpeedRpm,
                            double ratedPowerW, double ratedEfficiency, double ratedCurrentDensityAPerMm2,
                            double fill, double openCircuitLineRmsV, double maxSpeedRpm, double copperMassKg,
                            double magnetMassKg, double materialCost, OptionalDouble annualEnergyKWh) {

    static DesignFigures of(FullEvaluation f, SizingRequest req, boolean energy) {
        boolean wind = req.drive() instanceof WindDrive;
        return new DesignFigures(f.cutInSpeedRpm(),
                wind && Double.isFinite(f.cutInWindSpeedMs()) ? OptionalDouble.of(f.cutInWindSpeedMs())
                        : OptionalDouble.empty(), f.ratedSpeedRpm(), f.ratedPowerW(), f.ratedEfficiency(),
                f.ratedCurrentDensityAPerMm2(), f.fill(), f.openCircuitLineRmsV(), f.maxSpeedRpm(), f.copperMassKg(),
                f.magnetMassKg(), f.cost(req.prices()),
                energy ? OptionalDouble.of(f.annualEnergyKWh()) : OptionalDouble.empty());
    }

    /** Copper plus magnet mass, kg. */
    public double activeMassKg() {
        return copperMassKg + magnetMassKg;
    }
}
