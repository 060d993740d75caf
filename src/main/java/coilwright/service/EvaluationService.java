package coilwright.service;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.EvaluationRequest;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;

/** The calculations the API and the pages share: evaluate a design, lay out a winding, list the catalogues. */
public final class EvaluationService {
    private final Catalogue catalogue = Catalogue.build();
    private final ResultCache cache;

    /** With a cache of its own (tests, tools); the running service shares one through {@link Services}. */
    public EvaluationService() {
        this(new ResultCache(ResultCache.DEFAULT_BUDGET_BYTES));
    }

    public EvaluationService(ResultCache cache) {
        this.cache = cache;
    }

    /**
     * An alternator and its load over a speed range. Evaluation is a pure function of the request (a record with
     * value equality), so an equal request is answered from the shared {@link ResultCache}.
     *
     * @throws coilwright.validation.InvalidInputException     when a part is out of range; fields are paths in the
     *                                                         request ({@code alternator.winding.slots})
     * @throws coilwright.validation.InfeasibleDesignException when the design cannot be built; its field is a path in
     *                                                         the request
     * @throws coilwright.validation.SolverFailedException     when a numerical method gives up on the input
     */
    public AlternatorEvaluation evaluate(EvaluationRequest request) {
        return cache.get(request, r -> AlternatorEvaluator.evaluate(alternator(r.alternator()), r));
    }

    /** A winding layout and its factors on its own; fields are those of the winding spec (the request body). */
    public Winding layout(WindingSpec spec) {
        return cache.get(spec, StarOfSlots::layout);
    }

    /** Magnet grades, wire sizes, battery chemistries, cooling bands, insulation classes and diodes. */
    public Catalogue catalogue() {
        return catalogue;
    }

    /** The machine of a request whose alternator part is called {@code alternator}, with its errors placed there. */
    static Alternator alternator(coilwright.machine.AlternatorSpec spec) {
        return RequestPaths.under("alternator", () -> AlternatorModel.build(spec));
    }
}
