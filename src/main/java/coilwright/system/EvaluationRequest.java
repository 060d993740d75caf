package coilwright.system;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.validation.Checks;

/**
 * An alternator, its load and the speeds to evaluate it at.
 *
 * @param alternator     the machine
 * @param load           a battery through a rectifier, or resistors
 * @param speedRange     the speeds to tabulate
 * @param ratedSpeedRpm  the speed the summary reports as rated; 0 = the top of the speed range
 * @param maxSpeedRpm    the highest speed the machine can reach (runaway, furling failure) for the open-circuit
 *                       voltage caution; 0 = twice the rated speed
 */
public record EvaluationRequest(AlternatorSpec alternator, Load load, SpeedRange speedRange, double ratedSpeedRpm,
                                double maxSpeedRpm) {
    public EvaluationRequest {
        new Checks().present("alternator", alternator).present("load", load).present("speedRange", speedRange)
                .range("ratedSpeedRpm", ratedSpeedRpm, 0, 100_000).range("maxSpeedRpm", maxSpeedRpm, 0, 200_000)
                .throwIfAny();
    }

    /** The rated speed in use, rpm. */
    public double effectiveRatedSpeedRpm() {
        return ratedSpeedRpm > 0 ? ratedSpeedRpm : speedRange.maxRpm();
    }

    /** The speed the open-circuit voltage is checked at, rpm. */
    public double effectiveMaxSpeedRpm() {
        return maxSpeedRpm > 0 ? maxSpeedRpm : 2 * effectiveRatedSpeedRpm();
    }
}
