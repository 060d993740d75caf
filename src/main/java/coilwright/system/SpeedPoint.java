package coilwright.system;

import coilwright.load.ConductionMode;

/**
 * The alternator and its load at one shaft speed. Phase quantities are winding quantities; line quantities are at
 * the terminals. For a resistive load the DC fields are zero.
 *
 * @param speedRpm                   shaft speed, rpm
 * @param frequencyHz                electrical frequency, Hz
 * @param emfPhaseRmsV               open-circuit phase EMF (fundamental), V rms
 * @param emfLineRmsV                open-circuit line EMF (fundamental), V rms
 * @param terminalLineRmsV           line voltage at the terminals under load, V rms
 * @param dcVoltageAtRectifierV      average rectifier output, V
 * @param dcCurrentA                 average battery current, A
 * @param phaseCurrentRmsA           rms winding current, A
 * @param lineCurrentRmsA            rms line current, A
 * @param powerToLoadW               power into the battery or the load resistors, W
 * @param windingCopperLossW         copper loss in the winding at its working temperature, W
 * @param cableLossW                 AC plus DC cable loss, W
 * @param batteryInternalLossW       loss in the battery's internal resistance, W
 * @param diodeLossW                 rectifier diode loss, W
 * @param shaftPowerW                mechanical power into the alternator (electromagnetic power; iron and friction losses are not modelled), W
 * @param shaftTorqueNm              torque needed at the shaft, N m
 * @param efficiency                 power to load over shaft power (0 where nothing flows)
 * @param currentDensityAPerMm2      rms current density in the winding copper, A/mm^2
 * @param mode                       rectifier conduction mode
 */
public record SpeedPoint(
        double speedRpm,
        double frequencyHz,
        double emfPhaseRmsV,
        double emfLineRmsV,
        double terminalLineRmsV,
        double dcVoltageAtRectifierV,
        double dcCurrentA,
        double phaseCurrentRmsA,
        double lineCurrentRmsA,
        double powerToLoadW,
        double windingCopperLossW,
        double cableLossW,
        double batteryInternalLossW,
        double diodeLossW,
        double shaftPowerW,
        double shaftTorqueNm,
        double efficiency,
        double currentDensityAPerMm2,
        ConductionMode mode) {

    /** Standing still, or any point with no EMF: nothing flows. */
    public static SpeedPoint standstill() {
        return new SpeedPoint(0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, ConductionMode.ZERO_BELOW_CUT_IN);
    }

    /** Where the power goes (shaft power is the electromagnetic power here). */
    public PowerFlow powerFlow() {
        return PowerFlow.of(this);
    }

    /** Every loss between the shaft and the load, W. */
    public double totalLossW() {
        return windingCopperLossW + cableLossW + batteryInternalLossW + diodeLossW;
    }
}
