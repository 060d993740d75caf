package coilwright.system;

/**
 * Winding temperature and every loss at one shaft speed, with the copper at the temperature its own losses heat it to
 * (the coupled fixed point of {@link coilwright.thermal.WindingTemperature}). Energy balances:
 * {@code shaftPowerW = powerToLoadW + totalLossW()} within the rectifier solver's tolerance (about 1e-9 of the power).
 *
 * @param speedRpm               shaft speed, rpm
 * @param windingMeanC           mean winding temperature, C (the copper resistance of this point follows it)
 * @param windingHotSpotC        hottest copper, C (compared with the insulation class)
 * @param magnetC                rotor and magnet temperature from the thermal network, C
 * @param temperatureSettled     false when no steady state exists below 250 C (the winding would keep heating)
 * @param powerToLoadW           power into the battery or the load resistors, W
 * @param windingCopperLossW     I^2 R of the load current in the winding at windingMeanC, W
 * @param conductorEddyLossW     eddy-current loss in the conductors of air-cored coils (0 for slotted stators), W
 * @param deltaCirculationLossW  loss of the third-harmonic current circulating in a delta (0 in star), W
 * @param statorIronLossW        stator iron loss (0 for air-cored stators), W
 * @param bearingFrictionLossW   bearing friction, W
 * @param windageLossW           air friction of the rotor, W
 * @param diodeLossW             rectifier diode loss, W
 * @param cableLossW             AC plus DC cable loss, W
 * @param batteryInternalLossW   loss in the battery's internal resistance, W
 * @param shaftPowerW            mechanical power into the shaft: output plus every loss listed, W
 * @param shaftTorqueNm          shaftPowerW / omega, N m (0 at standstill)
 * @param efficiency             powerToLoadW / shaftPowerW (0 where nothing is delivered)
 */
public record LossPoint(double speedRpm, double windingMeanC, double windingHotSpotC, double magnetC,
                        boolean temperatureSettled, double powerToLoadW, double windingCopperLossW,
                        double conductorEddyLossW, double deltaCirculationLossW, double statorIronLossW,
                        double bearingFrictionLossW, double windageLossW, double diodeLossW, double cableLossW,
                        double batteryInternalLossW, double shaftPowerW, double shaftTorqueNm, double efficiency) {

    /**
     * Standing still: no loss, no power, everything at ambient.
     *
     * @param ambientC ambient air temperature, C
     */
    public static LossPoint standstill(double ambientC) {
        return new LossPoint(0, ambientC, ambientC, ambientC, true, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    /**
     * Where the electromagnetic power goes: the shaft power less the losses before the winding's EMF (conductor
     * eddy, delta circulation, iron, bearings, windage).
     */
    public PowerFlow powerFlow() {
        return new PowerFlow(powerToLoadW + windingCopperLossW + cableLossW + diodeLossW + batteryInternalLossW,
                powerToLoadW, windingCopperLossW, cableLossW, diodeLossW, batteryInternalLossW);
    }

    /** Every loss between the shaft and the load, W. */
    public double totalLossW() {
        return windingCopperLossW + conductorEddyLossW + deltaCirculationLossW + statorIronLossW
                + bearingFrictionLossW + windageLossW + diodeLossW + cableLossW + batteryInternalLossW;
    }

    /** Heat generated in the winding itself, W. */
    public double windingHeatW() {
        return windingCopperLossW + conductorEddyLossW + deltaCirculationLossW;
    }
}
