package coilwright.sizing;

import java.util.Locale;

/**
 * The battery must take power somewhere in the drive's range: the alternator must cut in below the highest speed
 * the drive turns it at (a wind rotor's speed limit or free-spinning speed at the top wind speed, a runner's
 * runaway). The figure is the cut-in speed; below the cut-in speed the bridge carries no current at all (the
 * closed-form threshold is exact), so the screen's verdict is exact up to rounding.
 *
 * @param topSpeedRpm the highest alternator speed the drive reaches, rpm
 * @param where       that speed in words
 */
record ChargingLimit(double topSpeedRpm, String where) implements Limit {
    @Override
    public String name() {
        return "charging";
    }

    @Override
    public String field() {
        return "drive";
    }

    @Override
    public String unit() {
        return "rpm";
    }

    @Override
    public double allowed() {
        return topSpeedRpm;
    }

    @Override
    public boolean upper() {
        return true;
    }

    @Override
    public double screenBound(ScreenValues s) {
        return s.cutInRpm;
    }

    /** The full model's cut-in speed, or 0 when the battery charges (so a charging design never breaks it). */
    @Override
    public double figure(FullEvaluation f) {
        return f.charges() ? 0 : Math.max(f.cutInSpeedRpm(), topSpeedRpm * (1 + 1e-12));
    }

    @Override
    public boolean rejects(FullEvaluation f) {
        return !f.charges();
    }

    /** A cut-in exactly at the top speed does not charge either: the threshold itself carries no current. */
    @Override
    public boolean screenRejects(ScreenValues s) {
        return s.cutInRpm > topSpeedRpm * (1 + SCREEN_MARGIN);
    }

    @Override
    public String phrase() {
        return String.format(Locale.ROOT, "cuts in below %.0f rpm (%s)", topSpeedRpm, where);
    }
}
