package coilwright.turbine;

/**
 * One point of a flow-duration curve.
 *
 * @param flowM3s        stream flow, m^3/s
 * @param percentOfTime  share of the year the flow is equalled or exceeded, %
 */
public record FlowDurationPoint(double flowM3s, double percentOfTime) {
}
