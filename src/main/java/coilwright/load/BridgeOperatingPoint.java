package coilwright.load;

/**
 * The periodic steady state of a battery charged through a diode bridge, as period averages and rms values.
 * Line quantities are at the alternator terminals; "delta phase" is the winding current a delta-connected
 * machine with the same terminal behaviour would carry.
 *
 * @param mode                          conduction mode
 * @param dcCurrentA                    average DC (battery) current, A
 * @param dcCurrentRmsA                 rms DC current, A
 * @param batteryVoltageV               battery voltage (open circuit), V
 * @param dcVoltageAtRectifierV         average rectifier output voltage, V
 * @param lineCurrentRmsA               rms line current, A
 * @param lineCurrentPeakA              peak line current, A
 * @param deltaPhaseCurrentPeakA        peak of (i_a - i_b)/3 over the phase pairs (three-phase) or the line peak
 * @param lineToLineTerminalVoltageRmsV rms line-to-line voltage at the alternator terminals (whole waveform), V
 * @param powerFromEmfW                 average of sum e_k i_k (electromagnetic power), W
 * @param powerToBatteryW               battery voltage times average DC current, W
 * @param windingCopperLossW            winding I^2 R loss, W
 * @param acCableLossW                  AC cable loss, W
 * @param dcCableLossW                  DC cable loss, W
 * @param batteryInternalLossW          loss in the battery's internal resistance, W
 * @param diodeLossW                    2 Vd times average DC current, W
 * @param conductionAngleDeg            electrical angle per period during which one diode conducts, degrees
 * @param commutationOverlapDeg         angle per commutation during which three diodes conduct, degrees
 */
public record BridgeOperatingPoint(ConductionMode mode, double dcCurrentA, double dcCurrentRmsA,
                                   double batteryVoltageV, double dcVoltageAtRectifierV, double lineCurrentRmsA,
                                   double lineCurrentPeakA, double deltaPhaseCurrentPeakA,
                                   double lineToLineTerminalVoltageRmsV, double powerFromEmfW,
                                   double powerToBatteryW, double windingCopperLossW, double acCableLossW,
                                   double dcCableLossW, double batteryInternalLossW, double diodeLossW,
                                   double conductionAngleDeg, double commutationOverlapDeg) {

    /** Sum of all losses, W. */
    public double totalLossW() {
        return windingCopperLossW + acCableLossW + dcCableLossW + batteryInternalLossW + diodeLossW;
    }

    /** Power to battery over power from the EMF (0 when nothing flows). */
    public double efficiencyFromEmf() {
        return powerFromEmfW > 0 ? powerToBatteryW / powerFromEmfW : 0;
    }

    /** powerFromEmfW minus battery power and losses, W: zero for an exact periodic solution. */
    public double energyBalanceResidualW() {
        return powerFromEmfW - powerToBatteryW - totalLossW();
    }
}
