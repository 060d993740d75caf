package coilwright.rewind;

/**
 * Predicted charging at the target speed, from the bridge rectifier's periodic steady state
 * ({@code coilwright.load.LoadSolver}) with no cables and no battery internal resistance.
 *
 * @param speedRpm            the target speed, rpm
 * @param frequencyHz         electrical frequency there, Hz
 * @param dcCurrentA          average battery current, A (0 below cut-in)
 * @param powerToBatteryW     power into the battery, W
 * @param phaseCurrentRmsA    rms winding phase current, A
 * @param copperLossW         winding copper loss at the target's winding temperature, W
 * @param diodeLossW          rectifier diode loss, W
 * @param efficiencyFromEmf   power to the battery over electromagnetic power
 * @param phaseInductanceH    phase inductance used, H (scaled with the series turns squared)
 */
public record OutputEstimate(double speedRpm, double frequencyHz, double dcCurrentA, double powerToBatteryW,
                             double phaseCurrentRmsA, double copperLossW, double diodeLossW,
                             double efficiencyFromEmf, double phaseInductanceH) {
}
