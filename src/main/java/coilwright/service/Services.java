package coilwright.service;

/**
 * Every service the web layer calls, built once at start-up.
 *
 * @param evaluation evaluate designs, lay out windings, catalogues
 * @param matching   match a wind rotor or a hydro runner to an alternator
 */
public record Services(EvaluationService evaluation, MatchingService matching) {

    /** The services with their default wiring. */
    public static Services create() {
        return new Services(new EvaluationService(), new MatchingService());
    }
}
