package coilwright.rewind;

import coilwright.machine.Connection;
import coilwright.validation.Checks;

/**
 * Conversions between phase and line (terminal) quantities of a star, delta or single-phase winding.
 * Star: V_LL = sqrt(3) V_ph, R_LL = 2 R_ph. Delta: V_LL = V_ph, R_LL = R_ph (2 R_ph) / (3 R_ph) = (2/3) R_ph.
 * Single phase: the two ends of the one phase are the terminals, V_LL = V_ph, R_LL = R_ph.
 */
public final class Terminals {
    private Terminals() {
    }

    /**
     * V_line / V_phase: sqrt(3) for a three-phase star, 1 for delta and for a single phase.
     *
     * @param phases     1 or 3
     * @param connection STAR or DELTA
     */
    public static double lineVoltageFactor(int phases, Connection connection) {
        check(phases, connection);
        return phases == 3 && connection == Connection.STAR ? Math.sqrt(3) : 1.0;
    }

    /**
     * R_line-to-line / R_phase: 2 for a three-phase star, 2/3 for delta, 1 for a single phase. The same factor
     * converts a line-to-line inductance reading to a phase inductance (mutual coupling between phases ignored).
     *
     * @param phases     1 or 3
     * @param connection STAR or DELTA
     */
    public static double lineResistanceFactor(int phases, Connection connection) {
        check(phases, connection);
        if (phases == 1) {
            return 1.0;
        }
        return connection == Connection.STAR ? 2.0 : 2.0 / 3.0;
    }

    private static void check(int phases, Connection connection) {
        Checks c = new Checks().require(phases == 1 || phases == 3, "phases", phases, "must be 1 or 3", "1 or 3")
                .present("connection", connection);
        if (phases == 1 && connection == Connection.DELTA) {
            c.require(false, "connection", connection, "a single-phase winding has no delta; use STAR", "STAR");
        }
        c.throwIfAny();
    }
}
