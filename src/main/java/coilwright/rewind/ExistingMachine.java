package coilwright.rewind;

import coilwright.conductor.CoilWindow;
import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;
import coilwright.validation.Checks;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;

import java.util.Locale;
import java.util.Optional;

/**
 * What is known of a machine to be reconnected or rewound.
 *
 * <p>When both the pole count and a frequency are given they must agree: 2p = 120 f / n within the stated
 * frequency and speed accuracies (worst-case sum). When the pole count is 0 it is inferred from the frequency
 * (the nearest even number; refused when the accuracies leave two even counts possible).
 *
 * @param slots          slots, or coil positions of an air-cored stator, 2..400
 * @param poles          magnet poles, even, 2..400; 0 = unknown (then measurements.measuredFrequencyHz is needed)
 * @param phases         1 or 3
 * @param layers         single or double layer
 * @param coilPitchSlots coil pitch in slots, 0 = automatic (as {@link WindingSpec})
 * @param connection     STAR or DELTA (single-phase: STAR)
 * @param coilsPerPhase  coils counted in one phase, 0 = take it from the layout; otherwise it must match the layout
 * @param parallelPaths  parallel paths per phase, 1..slots (must be one the layout allows)
 * @param turnsPerCoil   turns of each coil, 1..10000
 * @param wire           the wire now on the coils, with its strands in hand
 * @param coilWindow     the window of one coil side, or null when unknown (fill is then reported relative to now)
 * @param measurements   the readings, or null when nothing was measured (a plan then cannot be made)
 */
public record ExistingMachine(int slots, int poles, int phases, Layers layers, int coilPitchSlots,
                              Connection connection, int coilsPerPhase, int parallelPaths, int turnsPerCoil,
                              WireSpec wire, CoilWindow coilWindow, Measurements measurements) {
    public static final int MAX_TURNS_PER_COIL = 10_000;

    public ExistingMachine {
        Checks c = new Checks();
        c.intRange("slots", slots, 2, WindingSpec.MAX_SLOTS);
        c.require(poles == 0 || (poles >= 2 && poles <= WindingSpec.MAX_POLES && poles % 2 == 0), "poles", poles,
                "must be 0 (unknown) or an even number 2 to " + WindingSpec.MAX_POLES, "0, or even 2 to 400");
        c.require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3");
        c.present("layers", layers).present("connection", connection).present("wire", wire);
        c.require(coilPitchSlots >= 0 && coilPitchSlots <= Math.max(1, slots / 2), "coilPitchSlots", coilPitchSlots,
                "must be 0 (automatic) or 1 to half the slots", "0 or 1 to slots/2");
        c.intRange("coilsPerPhase", coilsPerPhase, 0, Math.max(1, slots));
        c.intRange("parallelPaths", parallelPaths, 1, Math.max(1, slots));
        c.intRange("turnsPerCoil", turnsPerCoil, 1, MAX_TURNS_PER_COIL);
        if (connection == Connection.DELTA && phases == 1) {
            c.require(false, "connection", connection, "a single-phase winding has no delta; use STAR", "STAR");
        }
        if (poles == 0 && (measurements == null || !measurements.hasFrequency())) {
            c.require(false, "poles", poles, "unknown, and no measurements.measuredFrequencyHz to infer it from;"
                    + " give the pole count or the frequency at the measured speed", "even 2 to 400, or a frequency");
        }
        if (measurements != null && measurements.hasFrequency() && !c.hasErrors()) {
            checkPolesAgainstFrequency(c, poles, measurements);
        }
        c.throwIfAny();
    }

    private static void checkPolesAgainstFrequency(Checks c, int poles, Measurements m) {
        double implied = m.impliedPoles();
        double band = implied * (m.frequencyAccuracyPercent() + m.speedAccuracyPercent()) / 100.0;
        String where = String.format(Locale.ROOT, "the measured %.1f Hz at %s rpm", m.measuredFrequencyHz(),
                MachineCharacteriser.fmtRpm(m.measuredSpeedRpm()));
        if (poles > 0) {
            int nearest = nearestEvenPoles(implied);
            c.require(Math.abs(poles - implied) <= band + 1e-9, "poles", poles, String.format(Locale.ROOT,
                    "does not fit %s, which implies %s poles (120 f / n = %.2f, +-%.2f from the stated accuracies)",
                    where, nearest, implied, band), nearest + " from the frequency");
            return;
        }
        int nearest = nearestEvenPoles(implied);
        c.require(Math.abs(nearest - implied) <= band + 1e-9, "measurements.measuredFrequencyHz",
                m.measuredFrequencyHz(), String.format(Locale.ROOT, "%s implies 120 f / n = %.2f poles (+-%.2f), "
                        + "not an even whole number; check the frequency and speed readings", where, implied, band),
                "a frequency giving an even pole count");
        c.require(band < 1.0, "measurements.measuredFrequencyHz", m.measuredFrequencyHz(), String.format(Locale.ROOT,
                "%s implies %.2f poles +-%.2f: the stated accuracies allow more than one even pole count; "
                        + "give the pole count or measure more accurately", where, implied, band),
                "a reading accurate to better than +-1 pole");
    }

    /** The nearest even pole count (at least 2) to a fractional one. */
    static int nearestEvenPoles(double implied) {
        return (int) Math.max(2, 2 * Math.round(implied / 2.0));
    }

    /** The pole count: the given one, or the one inferred from the measured frequency and speed. */
    public int polesUsed() {
        return poles > 0 ? poles : nearestEvenPoles(measurements.impliedPoles());
    }

    /** The winding as laid out for the pole count used (no skew). */
    public WindingSpec windingSpec() {
        return new WindingSpec(slots, polesUsed(), phases, layers, coilPitchSlots, parallelPaths, 0.0);
    }

    /** The measurements, if any. */
    public Optional<Measurements> measurementsIfTaken() {
        return Optional.ofNullable(measurements);
    }

    /** The coil window, if known. */
    public Optional<CoilWindow> coilWindowIfKnown() {
        return Optional.ofNullable(coilWindow);
    }
}
