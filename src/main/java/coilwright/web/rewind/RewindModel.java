package coilwright.web.rewind;

import coilwright.rewind.PoleOption;
import coilwright.rewind.RewindPlan;
import coilwright.service.RewindService;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.FieldErrors;
import coilwright.web.FormResult;
import coilwright.web.Units;
import coilwright.winding.WindingSpec;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The model of the {@code rewind} template: both forms, and the plan or the pole options when there are any.
 * The planner's own refusals (a resistance impossible for the stated turns and wire, a coil count that does not
 * match the layout, an unbalanced winding) come back beside their fields, as binding errors do.
 */
final class RewindModel {
    private RewindModel() {
    }

    static Map<String, Object> empty(Units units) {
        return base(FormResult.showing(RewindForm.defaults(units)), FormResult.showing(RewindForm.statorDefaults()),
                units);
    }

    /** The model after the main form was posted; "status" is 200 with a plan, else 400 (or 422 when infeasible). */
    static Map<String, Object> planned(FormResult<RewindRequest> form, RewindService service, Units units) {
        Map<String, Object> model = base(form, FormResult.showing(RewindForm.statorDefaults()), units);
        if (form.record().isEmpty()) {
            model.put("status", 400);
            return model;
        }
        RewindRequest request = form.record().get();
        try {
            RewindPlan plan = service.plan(request.machine(), request.target());
            model.put("plan", plan);
            model.put("machine", request.machine());
            model.put("links", new DesignLinks(request.machine(), plan));
            model.put("sameStator", sameStator(request, service));
            model.put("status", 200);
        } catch (InvalidInputException e) {
            model.put("form", withErrors(form, FieldErrors.of(e)));
            model.put("status", 400);
        } catch (InfeasibleDesignException e) {
            model.put("form", withErrors(form, FieldErrors.of(e)));
            model.put("status", 422);
        }
        return model;
    }

    /** The model after the bare-stator form was posted. */
    static Map<String, Object> stator(FormResult<StatorOptionsRequest> form, RewindService service, Units units) {
        Map<String, Object> model = base(FormResult.showing(RewindForm.defaults(units)), form, units);
        form.record().ifPresent(r -> model.put("statorResult", StatorOptionsResult.of(r,
                service.statorOptions(r.slots(), r.phases(), r.layers(), r.minPoles(), r.maxPoles()))));
        model.put("status", form.valid() ? 200 : 400);
        return model;
    }

    /** Other pole counts for the same stator, up to twice the slots (a magnet rotor for another speed). */
    private static StatorOptionsResult sameStator(RewindRequest request, RewindService service) {
        var m = request.machine();
        StatorOptionsRequest r = new StatorOptionsRequest(m.slots(), m.phases(), m.layers(), 2,
                Math.max(2, Math.min(WindingSpec.MAX_POLES, 2 * m.slots())));
        List<PoleOption> options = service.statorOptions(r.slots(), r.phases(), r.layers(), r.minPoles(), r.maxPoles());
        return StatorOptionsResult.of(r, options);
    }

    private static <T> FormResult<T> withErrors(FormResult<T> form, FieldErrors errors) {
        return new FormResult<>(Optional.empty(), errors, form.values());
    }

    private static Map<String, Object> base(FormResult<?> form, FormResult<?> statorForm, Units units) {
        Map<String, Object> model = new HashMap<>();
        model.put("form", form);
        model.put("statorForm", statorForm);
        model.put("fmt", new Fmt(units));
        model.put("poleLinks", new PoleLinks());
        model.put("layers", List.of("DOUBLE", "SINGLE"));
        model.put("connections", List.of("STAR", "DELTA"));
        model.put("gauges", List.of("AWG", "METRIC"));
        model.put("windowKinds", List.of("AIR_CORED", "SLOTTED"));
        model.put("targetKinds", List.of("BATTERY_CUT_IN", "LINE_VOLTAGE"));
        return model;
    }
}
