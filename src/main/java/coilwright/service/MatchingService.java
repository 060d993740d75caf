package coilwright.service;

import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.HydroMatcher;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.system.WindMatching;

/**
 * Turbine and site matching for the API and the pages: a wind rotor or a hydro runner with an alternator and load.
 * Errors in the machine are named under {@code alternator.}, as for an evaluation; results are cached like them.
 */
public final class MatchingService {
    private final ResultCache cache;

    public MatchingService(ResultCache cache) {
        this.cache = cache;
    }

    /** A wind rotor matched over the wind-speed table, with the annual energy and cautions. */
    public WindMatchResult wind(WindMatchRequest request) {
        return cache.get(request, r -> WindMatching.match(EvaluationService.alternator(r.alternator()), r));
    }

    /** A hydro runner matched at the design flow, with the runaway voltage and the energy per day and year. */
    public HydroMatchResult hydro(HydroMatchRequest request) {
        return cache.get(request, r -> HydroMatcher.match(EvaluationService.alternator(r.alternator()), r));
    }
}
