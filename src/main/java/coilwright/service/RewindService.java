package coilwright.service;

import coilwright.rewind.ExistingMachine;
import coilwright.rewind.PoleOption;
import coilwright.rewind.RewindPlan;
import coilwright.rewind.RewindPlanner;
import coilwright.rewind.RewindTarget;
import coilwright.rewind.StatorOptions;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import java.util.List;

/**
 * Reconnect or rewind a measured machine, and list the pole counts a bare stator can be wound for. The planner's
 * errors name fields of the machine record; here they are placed under {@code machine.} so that they match the
 * request body {@code {machine, target}} (the target's own errors come from its constructor while binding).
 */
public final class RewindService {

    /**
     * @throws InvalidInputException with fields under {@code machine.} (contradicting counts, impossible resistance)
     * @throws InfeasibleDesignException with its field under {@code machine.} (a winding that cannot be balanced)
     */
    public RewindPlan plan(ExistingMachine machine, RewindTarget target) {
        try {
            return RewindPlanner.plan(machine, target);
        } catch (InvalidInputException e) {
            throw e.under("machine");
        } catch (InfeasibleDesignException e) {
            throw new InfeasibleDesignException(e.field().isEmpty() ? "machine" : "machine." + e.field(),
                    e.getMessage());
        }
    }

    /** Balanced pole counts in [minPoles, maxPoles] for the slots, best winding factor first (may be empty). */
    public List<PoleOption> statorOptions(int slots, int phases, Layers layers, int minPoles, int maxPoles) {
        return StatorOptions.forSlots(slots, phases, layers, minPoles, maxPoles);
    }
}
