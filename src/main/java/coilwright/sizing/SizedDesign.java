package coilwright.sizing;

import coilwright.machine.AlternatorSpec;
import coilwright.safety.Caution;

import java.util.List;

/**
 * One proposed alternator. Its {@code alternator} is a complete specification: with the request's load it can be
 * evaluated, matched and saved like any design ({@link SizingRequest#evaluationRequest}).
 *
 * @param rank        1 = best by the objective (0 for designs listed only on the Pareto front or as near misses)
 * @param candidate   the candidate's number in the search space (stable for one request)
 * @param layout      the geometry and winding layout in words
 * @param alternator  the alternator specification
 * @param figures     its main numbers under the full model
 * @param cautions    the safety cautions with its drive and load (open-circuit voltage at the highest speed first
 *                    when it is dangerous), most serious first; they defer to local codes and licensed practice
 */
public record SizedDesign(int rank, long candidate, String layout, AlternatorSpec alternator, DesignFigures figures,
                          List<Caution> cautions) {
    public SizedDesign {
        cautions = List.copyOf(cautions);
    }
}
