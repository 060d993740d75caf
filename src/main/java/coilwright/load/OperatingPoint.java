package coilwright.load;

/**
 * One operating point of an alternator and its load (battery through a bridge, or resistors).
 * Phase quantities are winding quantities (for delta: the current inside the winding); line quantities are
 * at the alternator terminals. DC fields are zero for a resistive load.
 *
 * @param mode                          conduction mode (SINUSOIDAL_RESISTIVE for resistors)
 * @param lineToLineTerminalVoltageRmsV rms line-to-line voltage at the alternator terminals, V
 *                                      (single-phase: the terminal voltage)
 * @param phaseCurrentRmsA              rms winding phase current, A
 * @param phaseCurrentPeakA             peak winding phase current, A
 * @param lineCurrentRmsA               rms line current, A
 * @param lineCurrentPeakA              peak line current, A
 * @param powerFromEmfW                 electromagnetic power (average of EMF times current), W
 * @param powerToLoadW                  power into the battery (Vb * Idc) or the load resistors, W
 * @param windingCopperLossW            winding copper loss, W
 * @param acCableLossW                  AC cable loss, W
 * @param dcCableLossW                  DC cable loss, W
 * @param batteryInternalLossW          loss in the battery's internal resistance, W
 * @param diodeLossW                    rectifier diode loss, W
 * @param dcCurrentA                    average battery current, A
 * @param dcCurrentRmsA                 rms battery current, A
 * @param dcVoltageAtRectifierV         average rectifier output voltage, V
 * @param batteryVoltageV               battery voltage, V
 * @param conductionAngleDeg            conduction angle of one diode per electrical period, degrees
 * @param commutationOverlapDeg         commutation overlap angle (three-phase bridge), degrees
 */
public record OperatingPoint(ConductionMode mode, double lineToLineTerminalVoltageRmsV, double phaseCurrentRmsA,
                             double phaseCurrentPeakA, double lineCurrentRmsA, double lineCurrentPeakA,
                             double powerFromEmfW, double powerToLoadW, double windingCopperLossW,
                             double acCableLossW, double dcCableLossW, double batteryInternalLossW,
                             double diodeLossW, double dcCurrentA, double dcCurrentRmsA,
                             double dcVoltageAtRectifierV, double batteryVoltageV, double conductionAngleDeg,
                             double commutationOverlapDeg) {

    /** Sum of all losses outside the load, W. */
    public double totalLossW() {
        return windingCopperLossW + acCableLossW + dcCableLossW + batteryInternalLossW + diodeLossW;
    }

    /** Power to the load over electromagnetic power (0 when nothing flows). */
    public double efficiencyFromEmf() {
        return powerFromEmfW > 0 ? powerToLoadW / powerFromEmfW : 0;
    }
}
