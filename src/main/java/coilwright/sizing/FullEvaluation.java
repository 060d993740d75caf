package coilwright.sizing;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorSpec;
import coilwright.safety.Caution;
import coilwright.system.SpeedPoint;

import java.util.List;

/**
 * One candidate under the full model. Figures that do not apply to the drive are 0; a wind design that never charges
 * has an infinite cut-in wind speed (internal only: {@link DesignFigures} reports it as absent).
 *
 * @param spec                         the candidate
 * @param refusal                      why the full model refused it; empty when it was built and evaluated
 * @param charges                      the battery takes power somewhere in the drive's range
 * @param cutInSpeedRpm                closed-form cut-in speed of the built machine, rpm
 * @param cutInWindSpeedMs             wind: lowest tabulated wind speed that charges, m/s
 * @param ratedSpeedRpm                alternator speed at the rated point, rpm
 * @param ratedPowerW                  power into the battery at the rated point, W
 * @param ratedEfficiency              battery power over alternator shaft power at the rated point
 * @param ratedCurrentDensityAPerMm2   winding current density at the rated point, A/mm^2
 * @param fill                         coil fill on the window's basis
 * @param openCircuitLineRmsV          open-circuit line EMF at the highest speed, V rms
 * @param maxSpeedRpm                  that speed, rpm
 * @param copperMassKg                 copper of all phases, kg
 * @param magnetMassKg                 magnets, kg
 * @param annualEnergyKWh              energy into the battery per year, kWh (0 without a wind regime or flow-duration curve)
 * @param ratedShaftTorqueNm           alternator shaft torque at the rated point, N m (0 where nothing flows)
 * @param cautions                     the safety cautions of the design with its drive and load, most serious first
 * @param ratedWindingHotSpotC         steady hot spot of the winding at the rated point, C; NaN when not worked out
 *                                     (see {@link MachineFigures})
 * @param coggingPeakNm                peak cogging torque, N m (0 for an air-cored stator)
 */
record FullEvaluation(AlternatorSpec spec, String refusal, boolean charges, double cutInSpeedRpm,
                      double cutInWindSpeedMs, double ratedSpeedRpm, double ratedPowerW, double ratedEfficiency,
                      double ratedCurrentDensityAPerMm2, double fill, double openCircuitLineRmsV, double maxSpeedRpm,
                      double copperMassKg, double magnetMassKg, double annualEnergyKWh, double ratedShaftTorqueNm,
                      List<Caution> cautions, double ratedWindingHotSpotC, double coggingPeakNm) {
    FullEvaluation {
        cautions = List.copyOf(cautions);
    }

    /** Figures of a built machine from a drive's evaluation; the machine's own figures are added later. */
    static FullEvaluation of(Alternator alt, boolean charges, double cutInSpeedRpm, double cutInWindSpeedMs,
                             SpeedPoint rated, double openCircuitLineRmsV, double maxSpeedRpm, double annualEnergyKWh,
                             List<Caution> cautions) {
        return new FullEvaluation(alt.spec(), "", charges, cutInSpeedRpm, cutInWindSpeedMs, rated.speedRpm(),
                rated.powerToLoadW(), rated.efficiency(), rated.currentDensityAPerMm2(), fillOf(alt),
                openCircuitLineRmsV, maxSpeedRpm, alt.copperMassKg(), alt.magnetMassKg(), annualEnergyKWh,
                rated.shaftTorqueNm(), cautions, Double.NaN, 0);
    }

    /** The full model refused the candidate: no figure can be trusted. */
    static FullEvaluation refused(AlternatorSpec spec, String reason) {
        return new FullEvaluation(spec, reason, false, 0, Double.POSITIVE_INFINITY, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0,
                0, List.of(), Double.NaN, 0);
    }

    /** A copy with the machine's own figures: winding hot spot at the rated point (NaN: not worked out) and cogging. */
    FullEvaluation withMachine(double hotSpotC, double coggingNm) {
        return new FullEvaluation(spec, refusal, charges, cutInSpeedRpm, cutInWindSpeedMs, ratedSpeedRpm, ratedPowerW,
                ratedEfficiency, ratedCurrentDensityAPerMm2, fill, openCircuitLineRmsV, maxSpeedRpm, copperMassKg,
                magnetMassKg, annualEnergyKWh, ratedShaftTorqueNm, cautions, hotSpotC, coggingNm);
    }

    /** Peak cogging torque as a percentage of the rated shaft torque; infinite when no torque is taken at rated. */
    double coggingPercentOfRated() {
        if (coggingPeakNm == 0) {
            return 0;
        }
        return ratedShaftTorqueNm > 0 ? 100 * coggingPeakNm / ratedShaftTorqueNm : Double.POSITIVE_INFINITY;
    }

    /** Figures of a built machine that never charges in the drive's range. */
    static FullEvaluation neverCharges(Alternator alt, double cutInRpm, double openCircuitV, double maxSpeedRpm,
                                       List<Caution> cautions) {
        return new FullEvaluation(alt.spec(), "", false, cutInRpm, Double.POSITIVE_INFINITY, 0, 0, 0, 0, fillOf(alt),
                openCircuitV, maxSpeedRpm, alt.copperMassKg(), alt.magnetMassKg(), 0, 0, cautions, Double.NaN, 0);
    }

    static double fillOf(Alternator alt) {
        return alt.fill().basis() == coilwright.conductor.FillCheck.Basis.COPPER_FILL ? alt.fill().copperFill()
                : alt.fill().wireFill();
    }

    boolean built() {
        return refusal.isEmpty();
    }

    double activeMassKg() {
        return copperMassKg + magnetMassKg;
    }

    double cost(MaterialPrices prices) {
        return copperMassKg * prices.copperPerKg() + magnetMassKg * prices.magnetPerKg(spec.rotor().grade().material());
    }
}
