package coilwright.service;

import coilwright.rewind.RewindPlan;
import coilwright.rewind.RewindPlanner;
import coilwright.rewind.StatorOptions;

/**
 * Reconnect or rewind a measured machine, and list the pole counts a bare stator can be wound for. The planner's
 * errors name fields of the machine record; here they are placed under {@code machine.} so that they match the
 * request body {@code {machine, target}} (the target's own errors come from its constructor while binding).
 */
public final class RewindService {
    private final ResultCache cache;

    public RewindService(ResultCache cache) {
        this.cache = cache;
    }

    /**
     * @throws coilwright.validation.InvalidInputException with fields under {@code machine.} (contradicting counts,
     *                                                     impossible resistance)
     * @throws coilwright.validation.InfeasibleDesignException with its field under {@code machine.} (a winding that
     *                                                         cannot be balanced)
     */
    public RewindPlan plan(RewindRequest request) {
        return cache.get(request, r -> RequestPaths.under("machine", () -> RewindPlanner.plan(r.machine(), r.target())));
    }

    /** Balanced pole counts in the request's range, in the order asked for (the list may be empty). */
    public StatorOptionsResult statorOptions(StatorOptionsRequest request) {
        return cache.get(request, r -> StatorOptionsResult.of(r,
                StatorOptions.forSlots(r.slots(), r.phases(), r.layers(), r.minPoles(), r.maxPoles(), r.ranking())));
    }
}
