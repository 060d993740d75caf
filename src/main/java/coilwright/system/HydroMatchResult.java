package coilwright.system;

import coilwright.safety.Caution;
import coilwright.turbine.PenstockResult;

import java.util.List;
import java.util.OptionalDouble;

/**
 * A micro-hydro runner matched to an alternator and load.
 *
 * @param penstock                      net head, losses, velocity and the Hazen-Williams cross-check at the design flow
 * @param runnerKind                    the kind of runner
 * @param runnerDiameterM               its diameter (given or solved), m
 * @param jetVelocityMs                 jet velocity Cv sqrt(2 g H_net), m/s (0 for crossflow)
 * @param nozzleDiameterM               jet diameter per nozzle, m (0 for crossflow)
 * @param hydraulicPowerW               water power rho g Q H_net, W
 * @param peakShaftPowerW               runner shaft power at its optimum speed, W
 * @param optimumRunnerSpeedRpm         runner speed of peak power, rpm
 * @param runawayRunnerSpeedRpm         unloaded runaway speed of the runner, rpm
 * @param runawayAlternatorSpeedRpm     the alternator's speed at runaway, rpm
 * @param openCircuitLineRmsVAtRunaway  the alternator's open-circuit line EMF at runaway, V rms
 * @param matched                       the matched operating point at the design flow
 * @param dailyEnergyKWh                energy per day at the design flow, kWh
 * @param annualEnergyKWh               energy per year from the flow-duration curve; empty when none was given
 * @param runnerCurve                   the runner's torque and power against speed at the design flow, for the chart
 * @param alternatorCurve               the alternator's demand referred to the runner shaft
 * @param cautions                      safety cautions (open-circuit voltage at runaway first), most serious first
 * @param warnings                      matching and penstock advice
 * @param heat                          steady winding temperature and every loss of the alternator at the matched
 *                                      speed, the copper at the temperature its own losses heat it to in still air
 *                                      at the ambient entered ({@link MachineLosses#steadyAt}); the matched point
 *                                      itself keeps the winding temperature entered
 */
public record HydroMatchResult(PenstockResult penstock, RunnerKind runnerKind, double runnerDiameterM,
                               double jetVelocityMs, double nozzleDiameterM, double hydraulicPowerW,
                               double peakShaftPowerW, double optimumRunnerSpeedRpm, double runawayRunnerSpeedRpm,
                               double runawayAlternatorSpeedRpm, double openCircuitLineRmsVAtRunaway,
                               HydroOperatingPoint matched, double dailyEnergyKWh, OptionalDouble annualEnergyKWh,
                               List<RunnerCurvePoint> runnerCurve, List<LoadCurvePoint> alternatorCurve,
                               List<Caution> cautions, List<String> warnings, LossPoint heat) {
    public HydroMatchResult {
        runnerCurve = List.copyOf(runnerCurve);
        alternatorCurve = List.copyOf(alternatorCurve);
        cautions = List.copyOf(cautions);
        warnings = List.copyOf(warnings);
    }
}
