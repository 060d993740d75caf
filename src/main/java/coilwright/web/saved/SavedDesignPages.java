package coilwright.web.saved;

import coilwright.service.DesignDocument;
import coilwright.service.DesignLibrary;
import coilwright.service.Recomputation;
import coilwright.service.SaveReceipt;
import coilwright.service.SavedRevision;
import coilwright.system.EvaluationRequest;
import coilwright.web.CarriedDesign;
import coilwright.web.Json;
import coilwright.web.NextSteps;
import coilwright.service.EvaluationService;
import coilwright.web.pages.DesignFigures;
import coilwright.web.pages.DesignInputs;
import coilwright.web.units.Units;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import com.fasterxml.jackson.core.JsonProcessingException;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/** The pages of saved designs. Title and notes are user text: templates show them with th:text only. */
public final class SavedDesignPages {
    private final DesignLibrary library;
    private final EvaluationService evaluation;
    private final RecordBinder binder = new RecordBinder(Json.mapper());

    public SavedDesignPages(DesignLibrary library, EvaluationService evaluation) {
        this.library = library;
        this.evaluation = evaluation;
    }

    public void newForm(Context ctx) {
        ctx.render("saved-new", Map.of("title", "Save or import a design"));
    }

    /**
     * Saves a design file (uploaded or pasted), or the design a results page hands on ({@code design},
     * {@link CarriedDesign}) with the optional {@code title} and {@code notes} typed beside it. The answer shows the
     * full permanent link and, once, the edit token.
     */
    public void save(Context ctx) {
        DesignDocument document = ctx.formParam(CarriedDesign.FIELD) != null ? carried(ctx)
                : binder.bind(submitted(ctx), DesignDocument.class);
        SaveReceipt outcome = library.save(document);
        outcome.editToken().ifPresent(token -> EditTokenHeader.keepPrivate(ctx));
        String link = "/d/" + outcome.designId();
        ctx.status(outcome.created() ? 201 : 200).render("saved-created", Map.of("outcome", outcome,
                "rev", library.revision(outcome.revisionId()), "fullLink", absolute(ctx, link), "unitsLink", link));
    }

    /** The design a page handed on, under the title typed (or a plain one naming the machine) and the notes typed. */
    private static DesignDocument carried(Context ctx) {
        EvaluationRequest design = CarriedDesign.decode(ctx.formParam(CarriedDesign.FIELD));
        String title = Optional.ofNullable(ctx.formParam("title")).map(String::strip).filter(t -> !t.isEmpty())
                .orElseGet(() -> defaultTitle(design));
        String notes = Optional.ofNullable(ctx.formParam("notes")).map(String::strip).orElse("");
        return new DesignDocument(DesignDocument.SCHEMA_VERSION, title, notes, design);
    }

    static String defaultTitle(EvaluationRequest design) {
        var w = design.alternator().winding();
        return w.slots() + "-slot " + w.poles() + "-pole alternator, " + design.alternator().turnsPerCoil()
                + " turns per coil";
    }

    /** The link as a client would type it: scheme and host of this request. */
    private static String absolute(Context ctx, String path) {
        return ctx.scheme() + "://" + ctx.host() + path;
    }

    public void latest(Context ctx) {
        show(ctx, library.latest(ctx.pathParam("designId")), false);
    }

    public void revision(Context ctx) {
        show(ctx, ofDesign(ctx), false);
    }

    public void recomputed(Context ctx) {
        show(ctx, ofDesign(ctx), true);
    }

    public void print(Context ctx) {
        SavedRevision r = ofDesign(ctx);
        Map<String, Object> model = new HashMap<>(Map.of("rev", r, "results", ResultView.of(library.tree(r.resultJson())),
                "inputs", DesignInputs.of(library.document(r).design(), Units.of(ctx))));
        model.putAll(figures(r, library.recompute(r)));
        ctx.render("saved-print", model);
    }

    /**
     * The charts and winding layout of a saved input as this server computes them (a cached evaluation: recomputing
     * already evaluated it), and whether they differ from the saved numbers. None when the tool cannot compute it.
     */
    private Map<String, Object> figures(SavedRevision r, Recomputation again) {
        if (again.results().isEmpty()) {
            return Map.of();
        }
        EvaluationRequest design = library.document(r).design();
        return Map.of("figures", DesignFigures.of(evaluation.evaluate(design), design), "figuresDiffer", again.differs());
    }

    public void compare(Context ctx) {
        String a = ctx.queryParam("a");
        String b = ctx.queryParam("b");
        Map<String, Object> model = new HashMap<>(Map.of("a", a == null ? "" : a, "b", b == null ? "" : b));
        if (a != null && !a.isBlank() && b != null && !b.isBlank()) {
            SavedRevision first = library.resolve(a.strip());
            SavedRevision second = library.resolve(b.strip());
            model.put("comparison", Comparison.of(library, first, second));
            CompareCurves.of(library.tree(first.resultJson()), library.tree(second.resultJson()))
                    .ifPresent(svg -> model.put("overlay", svg));
        }
        ctx.render("saved-compare", model);
    }

    public void demos(Context ctx) {
        ctx.render("saved-demos", Map.of("demos", library.demos()));
    }

    private void show(Context ctx, SavedRevision r, boolean recomputedView) {
        Recomputation again = library.recompute(r);
        Map<String, Object> model = new HashMap<>();
        model.put("rev", r);
        model.put("history", library.history(r.designId()));
        model.put("again", again);
        model.put("recomputedView", recomputedView);
        var design = library.document(r).design();
        model.put("next", NextSteps.saved(design, r.title(), r.designId()));
        model.put("inputs", DesignInputs.of(design, Units.of(ctx)));
        model.put("results", ResultView.of(recomputedView && again.results().isPresent() ? again.results().get()
                : library.tree(r.resultJson())));
        model.putAll(figures(r, again));
        ctx.render("saved-revision", model);
    }

    /** The revision named in the path, which must belong to the design named in the path. */
    private SavedRevision ofDesign(Context ctx) {
        SavedRevision r = library.revision(ctx.pathParam("revisionId"));
        if (!r.designId().equals(ctx.pathParam("designId"))) {
            throw new NotFoundException("The design at this address has no revision " + r.revisionId() + ".");
        }
        return r;
    }

    /** The design file from an uploaded {@code file} when one was chosen, else the {@code document} text field. */
    private static String submitted(Context ctx) {
        UploadedFile file = isMultipart(ctx) ? ctx.uploadedFile("file") : null;
        if (file != null && file.size() > 0) {
            try (InputStream in = file.content()) {
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        String text = ctx.formParam("document");
        return text == null ? "" : text;
    }

    private static boolean isMultipart(Context ctx) {
        String type = ctx.contentType();
        return type != null && type.toLowerCase(java.util.Locale.ROOT).startsWith("multipart/");
    }

}
