package coilwright.service;

import coilwright.store.Database;
import coilwright.store.DesignStore;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The service facade the web layer calls, built once at start-up: one {@link ResultCache} shared by every
 * calculation and one {@link ExampleCatalogue} shared by every page and route.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 * @param designs    saved designs: save, revise, read, recompute
 * @param matching   match a wind rotor or a hydro runner to an alternator
 * @param rewind     reconnect or rewind a measured machine; pole options of a bare stator
 * @param examples   the example designs from {@code examples/}
 * @param cache      the results of every calculation above, by request
 * @param sizing     design from requirements: searches answered inline or run as jobs
 */
public record Services(EvaluationService evaluation, DesignLibrary designs, MatchingService matching,
                       RewindService rewind, ExampleCatalogue examples, ResultCache cache,
                       SizingJobs sizing) {

    /** The services over an open database, with the examples on the class path. */
    public static Services create(Database database, ObjectMapper mapper) {
        return create(database, mapper, ExampleCatalogue.read(Services.class.getClassLoader(), mapper));
    }

    /** As {@link #create(Database, ObjectMapper)} with another example catalogue. */
    public static Services create(Database database, ObjectMapper mapper, ExampleCatalogue examples) {
        ResultCache cache = new ResultCache(ResultCache.DEFAULT_BUDGET_BYTES);
        EvaluationService evaluation = new EvaluationService(cache);
        return new Services(evaluation, new DesignLibrary(evaluation, new DesignStore(database), mapper,
                DesignLibrary.currentToolVersion()), new MatchingService(cache), new RewindService(cache), examples, cache,
                new SizingJobs(new SizingService(), SizingJobs.Settings.defaults(), java.time.Clock.systemUTC()));
    }
}
