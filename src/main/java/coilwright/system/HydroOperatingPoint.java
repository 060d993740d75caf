package coilwright.system;

import java.util.List;

/**
 * A hydro runner and its alternator at their matched speed. Power balance:
 * runnerPowerW = drivetrainLossW + powerToBatteryW + windingCopperLossW + cableLossW + batteryInternalLossW + diodeLossW.
 *
 * @param flowM3s                 flow through the runner, m^3/s
 * @param netHeadM                net head at the runner, m
 * @param runnerSpeedRpm          matched runner speed, rpm
 * @param alternatorSpeedRpm      matched alternator speed, rpm
 * @param speedShareOfOptimum     runner speed / its optimum speed (1 = best; 2 = runaway)
 * @param runnerPowerW            shaft power of the runner, W
 * @param drivetrainLossW         belt or coupling loss, W
 * @param alternatorShaftPowerW   power into the alternator shaft, W
 * @param powerToBatteryW         power into the battery (or load resistors), W
 * @param windingCopperLossW      winding copper loss, W
 * @param cableLossW              AC plus DC cable loss, W
 * @param batteryInternalLossW    battery internal-resistance loss, W
 * @param diodeLossW              rectifier loss, W
 * @param dcCurrentA              battery charging current, A
 * @param flags                   FREE_SPINNING, STALL (below 0.6 of the optimum speed), ABOVE_OPTIMUM (above 1.2)
 */
public record HydroOperatingPoint(double flowM3s, double netHeadM, double runnerSpeedRpm, double alternatorSpeedRpm,
                                  double speedShareOfOptimum, double runnerPowerW, double drivetrainLossW,
                                  double alternatorShaftPowerW, double powerToBatteryW, double windingCopperLossW,
                                  double cableLossW, double batteryInternalLossW, double diodeLossW, double dcCurrentA,
                                  List<MatchFlag> flags) {
    public HydroOperatingPoint {
        flags = List.copyOf(flags);
    }

    /** Where the alternator's power goes (its shaft power is the electromagnetic power). */
    public PowerFlow powerFlow() {
        return new PowerFlow(alternatorShaftPowerW, powerToBatteryW, windingCopperLossW, cableLossW, diodeLossW,
                batteryInternalLossW);
    }

    /** Every loss between the runner shaft and the battery, W. */
    public double totalLossW() {
        return drivetrainLossW + windingCopperLossW + cableLossW + batteryInternalLossW + diodeLossW;
    }
}
