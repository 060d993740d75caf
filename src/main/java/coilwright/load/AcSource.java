package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.Checks;

/**
 * The alternator at one operating point, as a balanced sinusoidal source behind its winding
 * resistance and inductance. EMF harmonics are ignored (fundamental only), so a delta winding carries
 * no circulating current in this model.
 *
 * @param phases             1 or 3
 * @param connection         STAR or DELTA (three-phase); single-phase sources must say STAR
 * @param emfPhaseRmsV       winding phase EMF, rms of the fundamental, 0 to 1e6 V
 * @param frequencyHz        electrical frequency, > 0 and <= 1e5 Hz
 * @param phaseResistanceOhm winding phase resistance at its working temperature, > 0 and <= 1e4 Ohm
 * @param phaseInductanceH   winding phase (synchronous) inductance, > 0 and <= 100 H
 */
public record AcSource(int phases, Connection connection, double emfPhaseRmsV, double frequencyHz,
                       double phaseResistanceOhm, double phaseInductanceH) {
    private static final double SQRT3 = Math.sqrt(3);

    public AcSource {
        Checks c = new Checks();
        c.require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3");
        c.present("connection", connection);
        c.require(!(phases == 1 && connection == Connection.DELTA), "connection", connection,
                "a single-phase source must be STAR", "STAR");
        c.range("emfPhaseRmsV", emfPhaseRmsV, 0, 1e6)
                .rangeExclusiveMin("frequencyHz", frequencyHz, 0, 1e5)
                .rangeExclusiveMin("phaseResistanceOhm", phaseResistanceOhm, 0, 1e4)
                .rangeExclusiveMin("phaseInductanceH", phaseInductanceH, 0, 100)
                .throwIfAny();
    }

    /** Phase EMF of the equivalent star, V rms: E for star, E/sqrt(3) for delta. */
    public double starEmfRmsV() {
        return connection == Connection.DELTA ? emfPhaseRmsV / SQRT3 : emfPhaseRmsV;
    }

    /** Phase resistance of the equivalent star, Ohm: R for star, R/3 for delta. */
    public double starResistanceOhm() {
        return connection == Connection.DELTA ? phaseResistanceOhm / 3 : phaseResistanceOhm;
    }

    /** Phase inductance of the equivalent star, H: L for star, L/3 for delta. */
    public double starInductanceH() {
        return connection == Connection.DELTA ? phaseInductanceH / 3 : phaseInductanceH;
    }

    /** Open-circuit line-to-line EMF, V rms (three-phase), or the winding EMF (single-phase). */
    public double lineEmfRmsV() {
        return phases == 3 ? SQRT3 * starEmfRmsV() : emfPhaseRmsV;
    }

    /** Electrical angular frequency, rad/s. */
    public double angularFrequencyRadPerS() {
        return 2 * Math.PI * frequencyHz;
    }

    /** The same source with another EMF and frequency (e.g. another speed). */
    public AcSource withEmfAndFrequency(double emfPhaseRmsV, double frequencyHz) {
        return new AcSource(phases, connection, emfPhaseRmsV, frequencyHz, phaseResistanceOhm, phaseInductanceH);
    }
}
