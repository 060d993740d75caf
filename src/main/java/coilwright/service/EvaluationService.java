package coilwright.service;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.EvaluationRequest;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;
import java.util.function.Supplier;

/** The calculations the API and the pages share: evaluate a design, lay out a winding, list the catalogues. */
public final class EvaluationService {
    /**
     * Evaluations kept for repeated identical requests (pages re-posting a form, scripts polling). An evaluation
     * of the largest speed range (1000 points) is about 0.2 MB, so the cache stays under about 13 MB.
     */
    public static final int CACHED_EVALUATIONS = 64;

    private final Catalogue catalogue = Catalogue.build();
    private final LruCache<EvaluationRequest, AlternatorEvaluation> evaluations;

    public EvaluationService() {
        this(CACHED_EVALUATIONS);
    }

    /** @param cachedEvaluations most evaluations kept, 0 for none */
    public EvaluationService(int cachedEvaluations) {
        this.evaluations = new LruCache<>(cachedEvaluations);
    }

    /**
     * An alternator and its load over a speed range. Evaluation is a pure function of the request (a record with
     * value equality), so identical requests are answered from a small LRU cache.
     *
     * @throws InvalidInputException     when a part is out of range; fields are paths in the request
     *                                   ({@code alternator.winding.slots})
     * @throws InfeasibleDesignException when the design cannot be built; its field is a path in the request
     */
    public AlternatorEvaluation evaluate(EvaluationRequest request) {
        return evaluations.get(request, this::compute);
    }

    private AlternatorEvaluation compute(EvaluationRequest request) {
        Alternator alternator = within("alternator", () -> AlternatorModel.build(request.alternator()));
        return AlternatorEvaluator.evaluate(alternator, request);
    }

    /** A winding layout and its factors on its own. */
    public Winding layout(WindingSpec spec) {
        return StarOfSlots.layout(spec);
    }

    /** Magnet grades, wire sizes, battery chemistries, cooling bands, insulation classes and diodes. */
    public Catalogue catalogue() {
        return catalogue;
    }

    /** Runs a part's calculation, placing its field paths under the part's name in the request. */
    private static <T> T within(String part, Supplier<T> calc) {
        try {
            return calc.get();
        } catch (InvalidInputException e) {
            throw e.under(part);
        } catch (InfeasibleDesignException e) {
            throw new InfeasibleDesignException(e.field().isEmpty() ? part : part + "." + e.field(), e.getMessage());
        }
    }
}
