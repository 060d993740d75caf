package coilwright.load;

import coilwright.validation.Checks;

/**
 * A balanced resistor bank, star-connected (three-phase) or a single resistor (single-phase).
 *
 * @param resistancePerPhaseOhm resistance per star phase, > 0 and <= 1e6 Ohm
 * @param acCable               alternator to load (one conductor per line)
 */
public record ResistiveLoad(double resistancePerPhaseOhm, Cable acCable) implements Load {
    public ResistiveLoad {
        new Checks().rangeExclusiveMin("resistancePerPhaseOhm", resistancePerPhaseOhm, 0, 1e6)
                .present("acCable", acCable).throwIfAny();
    }
}
