package coilwright.system;

import coilwright.cogging.CoggingTorque;
import coilwright.demag.DemagnetisationCheck;
import coilwright.losses.ShaftFriction;

import java.util.List;

/**
 * What the machine does to itself: the winding temperature its losses heat it to at each speed, every loss, the
 * cogging torque a rotor must overcome to start, and the demagnetisation margin under a short circuit.
 *
 * @param temperatureBasis          which winding temperature each figure uses, in words
 * @param ambientC                  ambient air temperature, C
 * @param assumptions               what was assumed because the design does not state it
 * @param points                    steady state at speeds across the evaluated range (at most
 *                                  {@link HeatAssessment#MAX_POINTS}, evenly spread, the top of the range included)
 * @param rated                     steady state at the rated speed
 * @param hottest                   the hottest of {@code points} and {@code rated}
 * @param insulationLimitC          hot-spot limit of the winding's insulation class (IEC 60085), C
 * @param insulationLimitReached    true when the hot spot reaches that limit within the evaluated range
 * @param insulationLimitSpeedRpm   the lowest speed at which it does, rpm (0 when it is not reached)
 * @param friction                  shaft friction, running and break-away
 * @param cogging                   cogging torque (none for air-cored stators)
 * @param startingTorqueNm          torque needed to turn the rotor from rest: peak cogging plus break-away friction,
 *                                  N m
 * @param demagnetisation           the worst-case short-circuit check at the hotter of the rated point's magnet
 *                                  temperature and the magnet temperature entered
 */
public record HeatAndLosses(String temperatureBasis, double ambientC, List<String> assumptions, List<LossPoint> points,
                            LossPoint rated, LossPoint hottest, double insulationLimitC, boolean insulationLimitReached,
                            double insulationLimitSpeedRpm, ShaftFriction friction, CoggingTorque cogging,
                            double startingTorqueNm, DemagnetisationCheck demagnetisation) {
    public HeatAndLosses {
        assumptions = List.copyOf(assumptions);
        points = List.copyOf(points);
    }
}
