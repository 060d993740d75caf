package coilwright.service;

import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.EvaluationRequest;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;

/** The calculations the API and the pages share: evaluate a design, lay out a winding, list the catalogues. */
public final class EvaluationService {

    private final Catalogue catalogue = Catalogue.build();

    /** An alternator and its load over a speed range. */
    public AlternatorEvaluation evaluate(EvaluationRequest request) {
        return AlternatorEvaluator.evaluate(request);
    }

    /** A winding layout and its factors on its own. */
    public Winding layout(WindingSpec spec) {
        return StarOfSlots.layout(spec);
    }

    /** Magnet grades, wire sizes, battery chemistries, cooling bands, insulation classes and diodes. */
    public Catalogue catalogue() {
        return catalogue;
    }
}
