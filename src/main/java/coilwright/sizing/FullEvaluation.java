package coilwright.sizing;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorSpec;
import coilwright.safety.Caution;

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
 * @param cautions                     the safety cautions of the design with its drive and load, most serious first
 */
record FullEvaluation(AlternatorSpec spec, String refusal, boolean charges, double cutInSpeedRpm,
                      double cutInWindSpeedMs, double ratedSpeedRpm, double ratedPowerW, double ratedEfficiency,
                      double ratedCurrentDensityAPerMm2, double fill, double openCircuitLineRmsV, double maxSpeedRpm,
                      double copperMassKg, double magnetMassKg, double annualEnergyKWh, List<Caution> cautions) {
    FullEvaluation {
        cautions = List.copyOf(cautions);
    }

    /** The full model refused the candidate: no figure can be trusted. */
    static FullEvaluation refused(AlternatorSpec spec, String reason) {
        return new FullEvaluation(spec, reason, false, 0, Double.POSITIVE_INFINITY, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0,
                List.of());
    }

    /** Figures of a built machine that never charges in the drive's range. */
    static FullEvaluation neverCharges(Alternator alt, double cutInRpm, double openCircuitV, double maxSpeedRpm,
                                       List<Caution> cautions) {
        return new FullEvaluation(alt.spec(), "", false, cutInRpm, Double.POSITIVE_INFINITY, 0, 0, 0, 0, fillOf(alt),
                openCircuitV, maxSpeedRpm, alt.copperMassKg(), alt.magnetMassKg(), 0, cautions);
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
