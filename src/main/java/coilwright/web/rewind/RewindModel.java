package coilwright.web.rewind;

import coilwright.rewind.RewindPlan;
import coilwright.service.RewindRequest;
import coilwright.service.RewindService;
import coilwright.service.StatorOptionsRequest;
import coilwright.service.StatorOptionsResult;
import coilwright.web.Choice;
import java.util.List;
import coilwright.web.FormResult;
import coilwright.winding.WindingSpec;
import java.util.HashMap;
import java.util.Map;

/** The model of the {@code rewind} template: both forms, and the plan or the pole options when there are any. */
final class RewindModel {
    /** The orders the pole options can be listed in, as the form offers them. */
    static final java.util.List<Choice> RANKINGS = java.util.List.of(
            new Choice("WINDING_FACTOR", "Highest winding factor first"),
            new Choice("COGGING", "Most cogging cycles (smoothest) first"),
            new Choice("BALANCED", "A balance of winding factor, cogging and pull"));
    private RewindModel() {
    }

    /** The page with its two forms. */
    static Map<String, Object> of(FormResult form, FormResult statorForm) {
        Map<String, Object> model = new HashMap<>();
        model.put("form", form);
        model.put("statorForm", statorForm);
        model.put("poleLinks", new PoleLinks());
        model.put("layers", Choice.LAYERS);
        model.put("rankings", RANKINGS);
        model.put("connections", Choice.words("STAR", "DELTA"));
        model.put("gauges", Choice.words("AWG", "METRIC"));
        model.put("windowKinds", List.of(new Choice("AIR_CORED", "Air-cored (no slots)"), new Choice("SLOTTED", "In slots")));
        model.put("targetKinds", Choice.labelled(targets()));
        return model;
    }

    /** The page after the main form was posted: the plan and the other pole counts of the same stator. */
    static Map<String, Object> planned(FormResult form, RewindRequest request, RewindService service) {
        RewindPlan plan = service.plan(request);
        Map<String, Object> model = of(form, FormResult.showing(RewindForm.statorDefaults()));
        model.put("plan", plan);
        model.put("machine", request.machine());
        model.put("links", new DesignLinks(request.machine(), plan, slotted(form, request)));
        model.put("sameStator", sameStator(request, service));
        return model;
    }

    /** The coils sit in slots: the window says so, or the form's window kind does when its area was left blank. */
    private static boolean slotted(FormResult form, RewindRequest request) {
        return request.machine().coilWindow().map(w -> w.kind() == coilwright.conductor.CoilWindow.Kind.SLOTTED)
                .orElse("SLOTTED".equals(form.value("machine.coilWindow.kind")));
    }

    /** Other pole counts for the same stator, up to twice the slots (a magnet rotor for another speed). */
    private static StatorOptionsResult sameStator(RewindRequest request, RewindService service) {
        var m = request.machine();
        return service.statorOptions(new StatorOptionsRequest(m.slots(), m.phases(), m.layers(), 2,
                Math.max(2, Math.min(WindingSpec.MAX_POLES, 2 * m.slots())), java.util.Optional.empty()));
    }

    private static java.util.Map<String, String> targets() {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        m.put("BATTERY_CUT_IN", "Start charging a battery at a speed");
        m.put("LINE_VOLTAGE", "A line voltage at a speed");
        return m;
    }
}
