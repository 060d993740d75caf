package coilwright.system;

import java.util.List;

/**
 * A wind rotor and its alternator at one wind speed. Power balance:
 * rotorPowerW = drivetrainLossW + powerToBatteryW + windingCopperLossW + cableLossW + batteryInternalLossW + diodeLossW
 * + alternatorDragLossW.
 *
 * @param windSpeedMs             free-stream wind speed, m/s
 * @param rotorSpeedRpm           the rotor's running speed, rpm (held at the maximum speed when over-speed)
 * @param alternatorSpeedRpm      the alternator's speed, rpm (rotor speed x drive ratio)
 * @param unlimitedRotorSpeedRpm  where the rotor would settle with no speed limit, rpm
 * @param tipSpeedRatio           lambda = omega R / v at the running speed
 * @param cp                      power coefficient delivered: rotor power over the wind's power through the swept area
 * @param rotorPowerW             power at the rotor shaft, W (when governed: only what the alternator takes)
 * @param drivetrainLossW         belt or gearbox loss, rotorPowerW x (1 - drivetrain efficiency), W
 * @param alternatorShaftPowerW   power into the alternator shaft, W (its running drag included)
 * @param powerToBatteryW         power into the battery (or load resistors), W
 * @param windingCopperLossW      winding copper loss, W
 * @param cableLossW              AC plus DC cable loss, W
 * @param batteryInternalLossW    battery internal-resistance loss, W
 * @param diodeLossW              rectifier loss, W
 * @param dcCurrentA              battery charging current, A
 * @param idealRotorPowerW        rotor power at its optimum tip-speed ratio (capped at the maximum speed), W
 * @param idealBatteryPowerW      idealRotorPowerW x drivetrain efficiency x the alternator's efficiency at the
 *                                matched point (where the rotor spins freely: at the speed of the ideal rotor), W;
 *                                so powerToBatteryW / idealBatteryPowerW = captureRatio wherever the battery charges
 * @param captureRatio            rotorPowerW / idealRotorPowerW, 0 to 1: how much of the best the rotor delivers
 * @param flags                   FREE_SPINNING, STALL, OVER_SPEED as they apply
 * @param alternatorDragLossW     the alternator's running drag (bearings, windage, iron, conductor eddy currents,
 *                                delta circulating current) at the winding temperature entered, W
 */
public record WindMatchPoint(double windSpeedMs, double rotorSpeedRpm, double alternatorSpeedRpm,
                             double unlimitedRotorSpeedRpm, double tipSpeedRatio, double cp, double rotorPowerW,
                             double drivetrainLossW, double alternatorShaftPowerW, double powerToBatteryW,
                             double windingCopperLossW, double cableLossW, double batteryInternalLossW,
                             double diodeLossW, double dcCurrentA, double idealRotorPowerW, double idealBatteryPowerW,
                             double captureRatio, List<MatchFlag> flags, double alternatorDragLossW) {
    public WindMatchPoint {
        flags = List.copyOf(flags);
    }

    /** No wind: nothing turns, nothing flows. */
    public static WindMatchPoint calm() {
        return new WindMatchPoint(0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, List.of(), 0);
    }

    /** Where the alternator's power goes (its shaft power is the electromagnetic power). */
    public PowerFlow powerFlow() {
        return new PowerFlow(alternatorShaftPowerW, powerToBatteryW, windingCopperLossW, cableLossW, diodeLossW,
                batteryInternalLossW);
    }

    /** Every loss between the rotor shaft and the battery, W. */
    public double totalLossW() {
        return drivetrainLossW + windingCopperLossW + cableLossW + batteryInternalLossW + diodeLossW
                + alternatorDragLossW;
    }

    public boolean has(MatchFlag flag) {
        return flags.contains(flag);
    }
}
