package coilwright.system;

/**
 * The alternator's demand referred to the turbine shaft: what the rotor or runner must deliver to drive the
 * alternator and its load at one speed (through the drive ratio and drivetrain efficiency).
 *
 * @param turbineSpeedRpm     rotor or runner speed, rpm
 * @param alternatorSpeedRpm  alternator speed, rpm
 * @param torqueAtTurbineNm   torque the turbine must give, N m (alternator torque x drive ratio / efficiency)
 * @param powerAtTurbineW     power the turbine must give, W (alternator shaft power / efficiency)
 * @param powerToBatteryW     what reaches the battery or load, W
 */
public record LoadCurvePoint(double turbineSpeedRpm, double alternatorSpeedRpm, double torqueAtTurbineNm,
                             double powerAtTurbineW, double powerToBatteryW) {
}
