package coilwright.sizing;

import coilwright.conductor.WireSpec;

/**
 * One conductor the search may wind with: a size and a number of strands in hand, with its areas worked out once.
 *
 * @param wire           the conductor
 * @param copperAreaM2   copper of all strands, m^2
 * @param overallAreaM2  enamelled circles of all strands, m^2
 */
record WireOption(WireSpec wire, double copperAreaM2, double overallAreaM2) {
    static WireOption of(WireSpec wire) {
        return new WireOption(wire, wire.conductorCopperAreaM2(), wire.conductorOverallAreaM2());
    }
}
