package coilwright.service;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.validation.SolverFailedException;
import java.util.function.Supplier;

/**
 * Places the fields named by a core calculation under the part of the request it was given. The core names fields
 * relative to the record it checks ({@code winding.slots} for a machine); a client sent a whole request, so every
 * route answers with the path in its own body ({@code alternator.winding.slots}), whatever the route.
 */
final class RequestPaths {
    private RequestPaths() {
    }

    /** Runs {@code calc} on the request's part called {@code part}, re-basing the field of any typed failure. */
    static <T> T under(String part, Supplier<T> calc) {
        try {
            return calc.get();
        } catch (InvalidInputException e) {
            throw e.under(part);
        } catch (InfeasibleDesignException e) {
            throw new InfeasibleDesignException(e.field().isEmpty() ? part : part + "." + e.field(), e.getMessage());
        } catch (SolverFailedException e) {
            throw e.under(part);
        }
    }
}
