package coilwright.sizing;

import java.util.List;
import java.util.OptionalDouble;

/**
 * The answer to a {@link SizingRequest}.
 *
 * @param objective       what the designs are ranked by
 * @param designs         the best designs meeting every limit under the full model, best first; empty when none does
 * @param provenBest      true when no candidate outside {@code designs} can beat the last of them (the search ran
 *                        to its end); false when it stopped at {@code maxFullEvaluations}
 * @param unexploredBound when not proven: no candidate left unevaluated can do better than this, in the
 *                        objective's unit (kWh, W, efficiency, kg or cost); empty when proven
 * @param paretoFront     designs meeting every limit that no other beats on both annual energy (or rated output) and
 *                        material cost (or active mass without prices), cheapest first
 * @param paretoComplete  true when the front is the whole front of the space; false when the budget ran out, and the
 *                        front is then that of the designs the full model evaluated
 * @param paretoValue     what the front trades: {@code annualEnergyKWh} or {@code ratedPowerW}
 * @param paretoCost      against what: {@code materialCost} or {@code activeMassKg}
 * @param nearMisses      when {@code designs} is empty: for each limit that binds, the closest design that meets the
 *                        others, closest first
 * @param limits          the limits applied, defaults resolved
 * @param counts          what the search did
 * @param notes           remarks for the user (defaults taken, what is not modelled)
 */
public record SizingResult(Objective objective, List<SizedDesign> designs, boolean provenBest,
                           OptionalDouble unexploredBound,
                           List<SizedDesign> paretoFront, boolean paretoComplete, String paretoValue, String paretoCost,
                           List<NearMiss> nearMisses, List<AppliedLimit> limits, SizingCounts counts,
                           List<String> notes) {
    public SizingResult {
        designs = List.copyOf(designs);
        paretoFront = List.copyOf(paretoFront);
        nearMisses = List.copyOf(nearMisses);
        limits = List.copyOf(limits);
        notes = List.copyOf(notes);
    }

    /** True when at least one design meets every limit. */
    public boolean feasible() {
        return !designs.isEmpty();
    }
}
