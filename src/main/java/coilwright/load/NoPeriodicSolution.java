package coilwright.load;

/**
 * One attempt of the bridge solver gave up (Newton stalled, too many switching events, an event solver's
 * evaluation limit). Internal: {@link BridgeSolver} falls back to the next method on it, and only when every
 * method has given up reports a {@link coilwright.validation.SolverFailedException} naming the circuit.
 */
final class NoPeriodicSolution extends RuntimeException {
    NoPeriodicSolution(String message) {
        super(message, null, false, false);
    }
}
