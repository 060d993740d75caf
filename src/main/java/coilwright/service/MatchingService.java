package coilwright.service;

import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.HydroMatcher;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.system.WindMatching;

/** Turbine and site matching for the API and the pages: a wind rotor or a hydro runner with an alternator and load. */
public final class MatchingService {

    /** A wind rotor matched over the wind-speed table, with the annual energy and cautions. */
    public WindMatchResult wind(WindMatchRequest request) {
        return WindMatching.match(request);
    }

    /** A hydro runner matched at the design flow, with the runaway voltage and the energy per day and year. */
    public HydroMatchResult hydro(HydroMatchRequest request) {
        return HydroMatcher.match(request);
    }
}
