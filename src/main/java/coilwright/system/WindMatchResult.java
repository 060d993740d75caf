package coilwright.system;

import coilwright.safety.Caution;
import coilwright.turbine.AnnualEnergyResult;
import coilwright.turbine.EnergyAssumptions;
import coilwright.turbine.WindClassAssessment;

import java.util.List;
import java.util.OptionalDouble;

/**
 * A wind rotor matched to an alternator and load over the wind-speed range, with the annual energy.
 *
 * @param airDensityKgM3               air density used, kg/m^3
 * @param airDensitySource             where it comes from, in words
 * @param optimumTipSpeedRatio         the Cp curve's best tip-speed ratio
 * @param maxCp                        the Cp curve's peak
 * @param stallTipSpeedRatio           below this tip-speed ratio a point is flagged STALL
 * @param points                       one matched point per wind speed, 0 to the top in 0.5 m/s steps
 * @param cutInWindSpeedMs             lowest tabulated wind speed at which the battery takes power; empty if none
 * @param annualEnergy                 annual energy to the battery by the IEC 61400-12-1 bin method, with its bins;
 *                                     the capacity factor refers to the largest battery power in the table
 * @param idealAnnualEnergyKWh         the same sum over the ideal battery power (rotor at its best, the alternator's
 *                                     efficiency at that speed), kWh
 * @param matchingPercent              100 x annual battery energy / ideal annual battery energy
 * @param rotorCapturePercent          100 x annual rotor energy matched / rotor energy at the optimum tip-speed ratio
 * @param windClass                    the IEC 61400-2 small wind class of the site's mean wind speed (context)
 * @param checkSpeedRpm                alternator speed of the open-circuit voltage check, rpm
 * @param checkSpeedSource             where that speed comes from, in words
 * @param openCircuitLineRmsVAtCheckSpeed open-circuit line EMF there, V rms
 * @param alternatorCurve              the alternator's demand referred to the rotor shaft, for the matching chart
 * @param cautions                     safety cautions, most serious first
 * @param warnings                     matching advice
 * @param overSpeedControl             the furling or power-limit control applied, in words
 * @param starting                     starting from rest against cogging and bearing friction
 * @param energyAssumptions            drivetrain efficiency and availability assumed, with the reason for each
 * @param deliveredAnnualEnergyKWh     annual energy to the battery after availability, kWh (annualEnergy is the
 *                                     IEC 61400-12-1 figure at 100 % availability)
 * @param peakHeat                     steady winding temperature and every loss at the matched point of greatest
 *                                     battery power
 */
public record WindMatchResult(double airDensityKgM3, String airDensitySource, double optimumTipSpeedRatio, double maxCp,
                              double stallTipSpeedRatio, List<WindMatchPoint> points, OptionalDouble cutInWindSpeedMs,
                              AnnualEnergyResult annualEnergy, double idealAnnualEnergyKWh, double matchingPercent,
                              double rotorCapturePercent, WindClassAssessment windClass, double checkSpeedRpm,
                              String checkSpeedSource, double openCircuitLineRmsVAtCheckSpeed,
                              List<LoadCurvePoint> alternatorCurve, List<Caution> cautions, List<String> warnings,
                              String overSpeedControl, WindStart starting, EnergyAssumptions energyAssumptions,
                              double deliveredAnnualEnergyKWh, LossPoint peakHeat) {
    public WindMatchResult {
        points = List.copyOf(points);
        alternatorCurve = List.copyOf(alternatorCurve);
        cautions = List.copyOf(cautions);
        warnings = List.copyOf(warnings);
    }
}
