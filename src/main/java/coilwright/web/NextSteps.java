package coilwright.web;

import coilwright.system.EvaluationRequest;
import java.util.Optional;

/**
 * What a user can do next from a page that shows one design (the {@code fragments/next :: steps} block): change it
 * in the design form, match it to a wind rotor or a water turbine, save it under a permanent link, and, for a saved
 * design, revise it with its edit token. Every link carries the design itself ({@link CarriedDesign}).
 *
 * @param carried    the design as the text of a {@link CarriedDesign#FIELD} field
 * @param title      the design's title, offered as the title to save under
 * @param changeLink the design form pre-filled with this design
 * @param windLink   the wind match page with this design as the alternator and its load
 * @param hydroLink  the hydro match page with this design
 * @param benchLink  the design's bench sheet
 * @param reviseLink for a saved design, its revise form (the design form with the edit token); else empty
 * @param saveable   true when the block offers to save the design (not on a saved revision)
 */
public record NextSteps(String carried, String title, String changeLink, String windLink, String hydroLink,
                        String benchLink, Optional<String> reviseLink, boolean saveable) {

    /** The next steps of an unsaved design (results pages, match results). */
    public static NextSteps of(EvaluationRequest design, String title) {
        return new NextSteps(CarriedDesign.encode(design), title, CarriedDesign.link("/design/new", design),
                CarriedDesign.link("/match/wind", design), CarriedDesign.link("/match/hydro", design),
                CarriedDesign.link("/design/bench?title=" + java.net.URLEncoder.encode(title,
                        java.nio.charset.StandardCharsets.UTF_8), design), Optional.empty(), true);
    }

    /** The next steps of a saved design: revise instead of save. */
    public static NextSteps saved(EvaluationRequest design, String title, String designId) {
        NextSteps n = of(design, title);
        return new NextSteps(n.carried, title, n.changeLink, n.windLink, n.hydroLink, n.benchLink,
                Optional.of("/d/" + designId + "/revise"), false);
    }
}
