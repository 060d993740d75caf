package coilwright.sizing;

import java.util.List;

/**
 * What the search did.
 *
 * @param layoutsConsidered        combinations of poles, coil or slot counts, magnets and sizes drafted
 * @param layoutsRejected          combinations not searched, by reason
 * @param layoutsSearched          layouts searched
 * @param candidatesInSpace        candidates: layouts with their parallel paths x wires x strands x turns x connections
 * @param screened                 candidates screened with the closed forms (all of them unless cancelled)
 * @param prunedByLimit            candidates the screen discarded, by the first limit each provably breaks
 * @param passedScreen             candidates left for the full model
 * @param fullyEvaluated           candidates evaluated with the full model
 * @param rejectedByFullModel      fully evaluated candidates that broke a limit, by the first limit broken
 *                                 ({@code model} when the full model refused the candidate)
 * @param returned                 designs returned
 */
public record SizingCounts(long layoutsConsidered, List<LimitCount> layoutsRejected, long layoutsSearched,
                           long candidatesInSpace, long screened, List<LimitCount> prunedByLimit, long passedScreen,
                           long fullyEvaluated, List<LimitCount> rejectedByFullModel, int returned) {
    public SizingCounts {
        layoutsRejected = List.copyOf(layoutsRejected);
        prunedByLimit = List.copyOf(prunedByLimit);
        rejectedByFullModel = List.copyOf(rejectedByFullModel);
    }
}
