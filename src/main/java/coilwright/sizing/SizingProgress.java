package coilwright.sizing;

/**
 * Progress of a running search, for a job that reports it. Called from the thread that runs the search, in order;
 * it must return quickly.
 */
@FunctionalInterface
public interface SizingProgress {
    /** Nothing reported. */
    SizingProgress NONE = (stage, done, total) -> { };

    /** The search's stages, in order. */
    enum Stage { LAYOUTS, SCREEN, REFINE, PARETO, NEAR_MISSES }

    /**
     * @param stage  the stage running
     * @param done   units done in it (layouts, candidates screened, full evaluations)
     * @param total  units in it, as far as known (the evaluation budget while refining)
     */
    void update(Stage stage, long done, long total);
}
