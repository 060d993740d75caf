package coilwright.sizing;

import coilwright.validation.Checks;

/**
 * Plain speed targets: charging starts at or below one speed and a given power goes into the battery at another.
 *
 * @param cutInSpeedRpm  charging must start at or below this alternator speed, rpm, &gt; 0 and &lt;= 20 000
 * @param ratedSpeedRpm  the rated alternator speed, rpm, above cutInSpeedRpm and &lt;= 20 000
 * @param ratedPowerW    power into the battery wanted at the rated speed, at least, W, &gt; 0 and &lt;= 1 000 000
 * @param maxSpeedRpm    highest speed the alternator can reach (for the open-circuit voltage), rpm, at least the
 *                       rated speed and &lt;= 40 000; 0 = twice the rated speed
 */
public record SpeedTargets(double cutInSpeedRpm, double ratedSpeedRpm, double ratedPowerW, double maxSpeedRpm)
        implements Drive {
    public SpeedTargets {
        Checks c = new Checks()
                .rangeExclusiveMin("cutInSpeedRpm", cutInSpeedRpm, 0, 20_000)
                .rangeExclusiveMin("ratedSpeedRpm", ratedSpeedRpm, 0, 20_000)
                .rangeExclusiveMin("ratedPowerW", ratedPowerW, 0, 1_000_000)
                .range("maxSpeedRpm", maxSpeedRpm, 0, 40_000);
        if (!c.hasErrors()) {
            c.require(ratedSpeedRpm > cutInSpeedRpm, "ratedSpeedRpm", ratedSpeedRpm,
                    "must be above cutInSpeedRpm = " + Checks.fmt(cutInSpeedRpm), "> cutInSpeedRpm");
            c.require(maxSpeedRpm == 0 || maxSpeedRpm >= ratedSpeedRpm, "maxSpeedRpm", maxSpeedRpm,
                    "must be 0 (twice the rated speed) or at least ratedSpeedRpm = " + Checks.fmt(ratedSpeedRpm),
                    "0 or >= ratedSpeedRpm");
        }
        c.throwIfAny();
    }

    /** The speed the open-circuit voltage is checked at, rpm. */
    public double effectiveMaxSpeedRpm() {
        return maxSpeedRpm > 0 ? maxSpeedRpm : 2 * ratedSpeedRpm;
    }
}
