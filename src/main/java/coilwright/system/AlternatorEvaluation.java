package coilwright.system;

import coilwright.conductor.CurrentDensity;
import coilwright.machine.Alternator;
import coilwright.safety.Caution;

import java.util.List;
import java.util.Optional;

/**
 * An alternator evaluated with its load over a speed range.
 *
 * @param alternator                  the machine's derived constants
 * @param cutInSpeedRpm               closed-form cut-in: sqrt(2) x peak-path EMF = battery + two diode drops
 *                                    (0 for a resistive load, which takes current at any speed)
 * @param cutInSpeedSolvedRpm         cut-in found on the solved operating curve (bisection on current > 0)
 * @param points                      the operating points, one per speed
 * @param rated                       the operating point at the rated speed
 * @param ratedCurrentDensity         winding current density at rated speed against the cooling band
 * @param openCircuitLineRmsVAtMaxSpeed open-circuit line EMF at the maximum speed, V rms
 * @param maxSpeedRpm                 the speed it is checked at
 * @param cautions                    safety cautions, most serious first
 * @param warnings                    design warnings (fill, temperatures, measured constants)
 * @param heatAndLosses               solved winding temperatures, the full loss breakdown, cogging and the
 *                                    demagnetisation margin
 */
public record AlternatorEvaluation(
        Alternator alternator,
        double cutInSpeedRpm,
        double cutInSpeedSolvedRpm,
        List<SpeedPoint> points,
        SpeedPoint rated,
        CurrentDensity ratedCurrentDensity,
        double openCircuitLineRmsVAtMaxSpeed,
        double maxSpeedRpm,
        List<Caution> cautions,
        List<String> warnings,
        HeatAndLosses heatAndLosses) {

    public AlternatorEvaluation {
        points = List.copyOf(points);
        cautions = List.copyOf(cautions);
        warnings = List.copyOf(warnings);
    }

    /** The operating point of greatest output in the range. */
    public Optional<SpeedPoint> peakOutput() {
        return points.stream().max(java.util.Comparator.comparingDouble(SpeedPoint::powerToLoadW));
    }
}
