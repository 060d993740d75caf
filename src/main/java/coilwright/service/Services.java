package coilwright.service;

/**
 * Every service the web layer calls, built once at start-up.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 * @param rewind     reconnect or rewind a measured machine; pole options of a bare stator
 */
public record Services(EvaluationService evaluation, RewindService rewind) {

    /** The services with their default wiring. */
    public static Services create() {
        return new Services(new EvaluationService(), new RewindService());
    }
}
