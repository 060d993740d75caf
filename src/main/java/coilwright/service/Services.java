package coilwright.service;

/**
 * Every service the web layer calls, built once at start-up.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 */
public record Services(EvaluationService evaluation) {

    /** The services with their default wiring. */
    public static Services create() {
        return new Services(new EvaluationService());
    }
}
