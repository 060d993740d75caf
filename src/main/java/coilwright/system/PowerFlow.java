package coilwright.system;

import coilwright.load.OperatingPoint;
import coilwright.validation.Checks;

/**
 * Where the electromagnetic power of one operating point goes, W: the breakdown every kind of operating point
 * shares ({@link SpeedPoint}, {@link LossPoint}, a wind or hydro match). Balance:
 * {@code powerFromEmfW = powerToLoadW + lossW()} within the rectifier solver's tolerance.
 *
 * @param powerFromEmfW        electromagnetic power, the average of EMF times current, W, &gt;= 0
 * @param powerToLoadW         power into the battery or the load resistors, W, &gt;= 0
 * @param windingCopperLossW   I^2 R in the winding, W, &gt;= 0
 * @param cableLossW           AC plus DC cable loss, W, &gt;= 0
 * @param diodeLossW           rectifier diode loss, W, &gt;= 0
 * @param batteryInternalLossW loss in the battery's internal resistance, W, &gt;= 0
 */
public record PowerFlow(double powerFromEmfW, double powerToLoadW, double windingCopperLossW, double cableLossW,
                        double diodeLossW, double batteryInternalLossW) {
    /** Nothing flows (standstill, or below cut-in). */
    public static final PowerFlow NONE = new PowerFlow(0, 0, 0, 0, 0, 0);

    public PowerFlow {
        new Checks().nonNegative("powerFromEmfW", powerFromEmfW).nonNegative("powerToLoadW", powerToLoadW)
                .nonNegative("windingCopperLossW", windingCopperLossW).nonNegative("cableLossW", cableLossW)
                .nonNegative("diodeLossW", diodeLossW).nonNegative("batteryInternalLossW", batteryInternalLossW)
                .throwIfAny();
    }

    /** The breakdown of a solved rectifier or resistor operating point. */
    public static PowerFlow of(OperatingPoint op) {
        return new PowerFlow(op.powerFromEmfW(), op.powerToLoadW(), op.windingCopperLossW(),
                op.acCableLossW() + op.dcCableLossW(), op.diodeLossW(), op.batteryInternalLossW());
    }

    /** The breakdown of a point of an evaluated curve. */
    public static PowerFlow of(SpeedPoint p) {
        return new PowerFlow(p.shaftPowerW(), p.powerToLoadW(), p.windingCopperLossW(), p.cableLossW(),
                p.diodeLossW(), p.batteryInternalLossW());
    }

    /** Every loss between the EMF and the load, W. */
    public double lossW() {
        return windingCopperLossW + cableLossW + diodeLossW + batteryInternalLossW;
    }
}
