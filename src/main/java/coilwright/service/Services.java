package coilwright.service;

import coilwright.store.Database;
import coilwright.store.DesignStore;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Every service the web layer calls, built once at start-up.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 * @param designs    saved designs: save, revise, read, recompute
 * @param matching   match a wind rotor or a hydro runner to an alternator
 * @param rewind     reconnect or rewind a measured machine; pole options of a bare stator
 */
public record Services(EvaluationService evaluation, DesignLibrary designs, MatchingService matching,
                       RewindService rewind) {

    /** The services with their default wiring over an open database and the service's JSON mapper. */
    public static Services create(Database database, ObjectMapper mapper) {
        EvaluationService evaluation = new EvaluationService();
        return new Services(evaluation, new DesignLibrary(evaluation, new DesignStore(database), mapper,
                DesignLibrary.currentToolVersion()), new MatchingService(), new RewindService());
    }
}
