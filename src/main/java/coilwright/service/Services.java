package coilwright.service;

import coilwright.store.Database;
import coilwright.store.DesignStore;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Every service the web layer calls, built once at start-up.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 * @param designs    saved designs: save, revise, read, recompute
 */
public record Services(EvaluationService evaluation, DesignLibrary designs) {

    /** The services with their default wiring over an open database and the service's JSON mapper. */
    public static Services create(Database database, ObjectMapper mapper) {
        EvaluationService evaluation = new EvaluationService();
        return new Services(evaluation, new DesignLibrary(evaluation, new DesignStore(database), mapper,
                DesignLibrary.currentToolVersion()));
    }
}
