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
 * @param ratedWindingHotSpotC        steady hot spot of the winding at the rated point (thermal model, still air at
 *                                    25 C), C; empty when it was not worked out
 * @param coggingPeakNm               peak cogging torque, N m (0 for an air-cored stator)
 * @param coggingPercentOfRatedTorque the peak cogging torque as a percentage of the shaft torque at the rated point;
 *                                    empty when no torque is taken there or cogging was not worked out
 */
public record DesignFigures(double cutInSpeedRpm, OptionalDouble cutInWindSpeedMs, double ratedSpeedRpm,
                            double ratedPowerW, double ratedEfficiency, double ratedCurrentDensityAPerMm2,
                            double fill, double openCircuitLineRmsV, double maxSpeedRpm, double copperMassKg,
                            double magnetMassKg, double materialCost, OptionalDouble annualEnergyKWh,
                            OptionalDouble ratedWindingHotSpotC, double coggingPeakNm,
                            OptionalDouble coggingPercentOfRatedTorque) {

    static DesignFigures of(FullEvaluation f, SizingRequest req, boolean energy) {
        boolean wind = req.drive() instanceof WindDrive;
        return new DesignFigures(f.cutInSpeedRpm(),
                wind && Double.isFinite(f.cutInWindSpeedMs()) ? OptionalDouble.of(f.cutInWindSpeedMs())
                        : OptionalDouble.empty(), f.ratedSpeedRpm(), f.ratedPowerW(), f.ratedEfficiency(),
                f.ratedCurrentDensityAPerMm2(), f.fill(), f.openCircuitLineRmsV(), f.maxSpeedRpm(), f.copperMassKg(),
                f.magnetMassKg(), f.cost(req.prices()),
                energy ? OptionalDouble.of(f.annualEnergyKWh()) : OptionalDouble.empty(),
                Double.isNaN(f.ratedWindingHotSpotC()) ? OptionalDouble.empty()
                        : OptionalDouble.of(f.ratedWindingHotSpotC()), f.coggingPeakNm(),
                Double.isFinite(f.coggingPercentOfRated()) && !Double.isNaN(f.ratedWindingHotSpotC())
                        ? OptionalDouble.of(f.coggingPercentOfRated()) : OptionalDouble.empty());
    }

    /** Copper plus magnet mass, kg. */
    public double activeMassKg() {
        return copperMassKg + magnetMassKg;
    }
}
