package coilwright.conductor;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.Locale;

/**
 * How full a coil window is with a given number of turns of a given wire.
 *
 * <ul>
 * <li>copper fill = turns * strands * bare copper area / window area;</li>
 * <li>wire fill = turns * strands * (pi/4) * overall diameter^2 / window area.</li>
 * </ul>
 * Practical limits (common practice): round wire in slots reaches a copper fill of about 0.35 to 0.45, so
 * above {@value #SLOTTED_COPPER_FILL_LIMIT} copper fill is HIGH; hand-wound air-cored coils reach a wire
 * fill of about 0.5 to 0.6, so above {@value #AIR_CORED_WIRE_FILL_LIMIT} wire fill is HIGH. The wires
 * CANNOT_FIT when their bounding squares (overall diameter squared) add up to more than the window,
 * i.e. wire fill &gt; pi/4: a hand-wound coil does not reach closer packing than square.
 *
 * @param copperFill     copper area / window area
 * @param wireFill       enamelled wire area / window area
 * @param practicalLimit the limit applied (to copper fill for slots, to wire fill for air-cored coils)
 * @param basis          which fill the limit applies to
 * @param level          OK, HIGH or CANNOT_FIT
 */
public record FillCheck(double copperFill, double wireFill, double practicalLimit, Basis basis, Level level) {
    /** Copper-fill limit for round wire in slots (common practice, range 0.35-0.45). */
    public static final double SLOTTED_COPPER_FILL_LIMIT = 0.45;
    /** Wire-fill limit (overall diameter) for hand-wound air-cored coils (common practice, range 0.5-0.6). */
    public static final double AIR_CORED_WIRE_FILL_LIMIT = 0.60;
    /** Square packing of round wires: the wire fill at which the bounding squares fill the window. */
    public static final double SQUARE_PACKING_WIRE_FILL = Math.PI / 4.0;

    /** Which fill a limit applies to. */
    public enum Basis { COPPER_FILL, WIRE_FILL }

    /** Verdict of a fill check. */
    public enum Level { OK, HIGH, CANNOT_FIT }

    /**
     * Checks one coil side.
     *
     * @param turnsPerCoil turns in the window, 1 to 100000
     * @param wire         the conductor (strands in hand count)
     * @param window       the window of one coil side
     */
    public static FillCheck of(int turnsPerCoil, WireSpec wire, CoilWindow window) {
        new Checks().intRange("turnsPerCoil", turnsPerCoil, 1, 100_000).present("wire", wire)
                .present("window", window).throwIfAny();
        double copper = turnsPerCoil * wire.conductorCopperAreaM2() / window.areaM2();
        double wireFill = turnsPerCoil * wire.conductorOverallAreaM2() / window.areaM2();
        boolean slotted = window.kind() == CoilWindow.Kind.SLOTTED;
        double limit = slotted ? SLOTTED_COPPER_FILL_LIMIT : AIR_CORED_WIRE_FILL_LIMIT;
        double measured = slotted ? copper : wireFill;
        Level level = wireFill > SQUARE_PACKING_WIRE_FILL ? Level.CANNOT_FIT
                : measured > limit ? Level.HIGH : Level.OK;
        return new FillCheck(copper, wireFill, limit, slotted ? Basis.COPPER_FILL : Basis.WIRE_FILL, level);
    }

    /**
     * This check, or a refusal when the wire cannot fit.
     *
     * @throws InfeasibleDesignException (field "wire") when the level is CANNOT_FIT
     */
    public FillCheck requireFits() {
        if (level == Level.CANNOT_FIT) {
            throw new InfeasibleDesignException("wire", String.format(Locale.ROOT,
                    "the turns do not fit their window: wire fill %.3f exceeds square packing %.3f "
                            + "(copper fill %.3f); use fewer turns, thinner wire or a larger window",
                    wireFill, SQUARE_PACKING_WIRE_FILL, copperFill));
        }
        return this;
    }

    /**
     * Most turns of a wire that fit a window with the wire fill not above {@code packingLimit}.
     *
     * @param window       the window of one coil side
     * @param wire         the conductor (strands in hand count)
     * @param packingLimit highest wire fill (overall-diameter circles / window), &gt; 0 and &lt;= pi/4
     * @return turns, &gt;= 0
     */
    public static int maxTurnsThatFit(CoilWindow window, WireSpec wire, double packingLimit) {
        new Checks().present("window", window).present("wire", wire)
                .rangeExclusiveMin("packingLimit", packingLimit, 0.0, SQUARE_PACKING_WIRE_FILL).throwIfAny();
        return (int) Math.floor(packingLimit * window.areaM2() / wire.conductorOverallAreaM2() * (1 + 1e-12));
    }
}
