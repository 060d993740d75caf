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
        Checks c = new Checks().present("alternator", alternator).present("load", load)
                .present("speedRange", speedRange)
                .range("ratedSpeedRpm", ratedSpeedRpm, 0, 100_000).range("maxSpeedRpm", maxSpeedRpm, 0, 200_000);
        // 0 means "use the range"; a given speed is a shaft's, not a rounding residue (below 1 rpm the frequency
        // and drag figures underflow and would be refused under names the user never sent)
        zeroOrAtLeastOne(c, "ratedSpeedRpm", ratedSpeedRpm, "100000");
        zeroOrAtLeastOne(c, "maxSpeedRpm", maxSpeedRpm, "200000");
        c.throwIfAny();
    }

    private static void zeroOrAtLeastOne(Checks c, String field, double rpm, String top) {
        if (rpm > 0 && rpm < SpeedRange.MIN_SPEED_RPM) {
            c.require(false, field, rpm, "must be 0 (from the speed range) or at least " + SpeedRange.MIN_SPEED_RPM
                    + " rpm", "0, or " + SpeedRange.MIN_SPEED_RPM + " to " + top);
        }
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
