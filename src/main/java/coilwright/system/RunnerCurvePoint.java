package coilwright.system;

/**
 * One point of a hydro runner's straight torque-speed line at its design flow.
 *
 * @param runnerSpeedRpm runner speed, rpm
 * @param torqueNm       runner shaft torque, N m
 * @param powerW         runner shaft power, W
 */
public record RunnerCurvePoint(double runnerSpeedRpm, double torqueNm, double powerW) {
}
