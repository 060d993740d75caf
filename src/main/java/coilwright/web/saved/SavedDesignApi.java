package coilwright.web.saved;

import coilwright.service.DesignDocument;
import coilwright.service.DesignLibrary;
import coilwright.service.SaveReceipt;
import coilwright.service.SavedRevision;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.pages.DesignEdit;
import coilwright.web.units.Fmt;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;

/** The JSON API of saved designs: save, revise, read, export, import, recompute and compare. */
public final class SavedDesignApi {
    private final DesignLibrary library;
    private final RecordBinder binder = new RecordBinder(Json.mapper());

    public SavedDesignApi(DesignLibrary library) {
        this.library = library;
    }

    public void create(Context ctx) {
        answer(ctx, library.save(binder.bind(ctx.body(), DesignDocument.class)));
    }

    /** Accepts the file as the body or as the multipart field {@code file}; validated like any other input. */
    public void importFile(Context ctx) {
        answer(ctx, library.save(binder.bind(uploadedText(ctx), DesignDocument.class)));
    }

    public void revise(Context ctx) {
        DesignDocument doc = binder.bind(ctx.body(), DesignDocument.class);
        answer(ctx, library.revise(ctx.pathParam("designId"), EditTokenHeader.of(ctx), doc));
    }

    public void design(Context ctx) {
        SavedRevision latest = library.latest(ctx.pathParam("designId"));
        var lines = library.history(latest.designId()).stream().map(s -> SavedJson.RevisionLine.of(latest.designId(), s)).toList();
        ctx.json(new SavedJson.Design(latest.designId(), latest.revisionId(), lines, view(latest)));
    }

    public void revision(Context ctx) {
        ctx.json(view(library.revision(ctx.pathParam("revisionId"))));
    }

    public void exportDesign(Context ctx) {
        export(ctx, library.latest(ctx.pathParam("designId")));
    }

    public void exportRevision(Context ctx) {
        export(ctx, library.revision(ctx.pathParam("revisionId")));
    }

    public void designCurves(Context ctx) {
        curves(ctx, library.latest(ctx.pathParam("designId")));
    }

    public void revisionCurves(Context ctx) {
        curves(ctx, library.revision(ctx.pathParam("revisionId")));
    }

    public void recomputed(Context ctx) {
        ctx.json(SavedJson.Recomputed.of(library.recompute(library.revision(ctx.pathParam("revisionId")))));
    }

    public void compare(Context ctx) {
        ctx.json(Comparison.of(library, library.resolve(required(ctx, "a")), library.resolve(required(ctx, "b"))));
    }

    public void demos(Context ctx) {
        ctx.json(library.demos().stream().map(d -> new SavedJson.Demo(d.slug(), d.designId(), d.latestRevisionId(),
                d.title(), "/d/" + d.designId())).toList());
    }

    private SavedJson.Revision view(SavedRevision r) {
        return SavedJson.Revision.of(r, library.tree(r.inputJson()), library.tree(r.resultJson()));
    }

    private static void answer(Context ctx, SaveReceipt receipt) {
        receipt.editToken().ifPresent(token -> EditTokenHeader.keepPrivate(ctx));
        ctx.status(receipt.created() ? 201 : 200).json(SavedJson.Saved.of(receipt));
    }

    private void export(Context ctx, SavedRevision r) {
        ctx.header("Content-Disposition", "attachment; filename=\"coilwright-" + r.revisionId() + ".json\"");
        ctx.json(library.document(r));
    }

    private void curves(Context ctx, SavedRevision r) {
        ctx.header("Content-Disposition", "attachment; filename=\"coilwright-" + r.revisionId() + "-curves.csv\"");
        String link = ctx.scheme() + "://" + ctx.host() + "/d/" + r.designId() + "/r/" + r.revisionId();
        var design = library.document(r).design();
        List<String> about = List.of("Coilwright operating points", "Title: " + r.title(), "Link: " + link,
                "Revision: " + r.number() + " (" + r.revisionId() + ")",
                "Units: SI, as each column header names them", "Saved: " + new Fmt(Units.SI).when(r.createdAt()),
                "Machine: " + DesignEdit.describe(design) + "; rated speed " + Fmt.plain(design.effectiveRatedSpeedRpm(), 4) + " rpm");
        ctx.contentType("text/csv; charset=utf-8").result(CurvesCsv.of(about, library.tree(r.resultJson())));
    }

    static String required(Context ctx, String name) {
        String v = ctx.queryParam(name);
        if (v == null || v.isBlank()) {
            throw new InvalidInputException(new FieldError(name, "missing", name + ": a design or revision id is required",
                    "a 22-character design or revision id"));
        }
        return v.strip();
    }

    static String uploadedText(Context ctx) {
        String type = ctx.contentType();
        if (type == null || !type.toLowerCase(java.util.Locale.ROOT).startsWith("multipart/")) {
            return ctx.body();
        }
        UploadedFile file = ctx.uploadedFile("file");
        if (file == null) {
            String text = ctx.formParam("document");
            if (text != null) {
                return text;
            }
            throw new InvalidInputException(new FieldError("file", "missing", "file: a design file is required",
                    "a design file (JSON)"));
        }
        try (InputStream in = file.content()) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
