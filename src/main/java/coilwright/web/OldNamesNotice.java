package coilwright.web;

import coilwright.service.OldFieldNames;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.http.Context;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * Tells an API client that its JSON body used input names that have been replaced: the request is answered as
 * usual (the old names bind for ever, see {@link OldFieldNames}) and the response carries the header
 * {@value #HEADER} listing each old name with the name that replaces it, e.g.
 * {@code alternator.rotor.statorThicknessM -> alternator.rotor.coilLayerThicknessM}. Documented in the OpenAPI
 * document (components/headers) and in DEVELOPERS.md.
 */
public final class OldNamesNotice {
    /** The response header naming the replaced input names a request used. */
    public static final String HEADER = "Coilwright-Deprecated-Fields";

    private OldNamesNotice() {
    }

    /** A before-filter for {@code /api/*}: reads a JSON body only when it may hold an old name. */
    public static void mark(Context ctx) {
        String type = ctx.contentType();
        if (type != null && type.toLowerCase(Locale.ROOT).startsWith("multipart/")) {
            return;
        }
        String body = ctx.body();
        if (body.isEmpty() || !OldFieldNames.mayHoldOldNames(body)) {
            return;
        }
        List<OldFieldNames.Rename> renames;
        try {
            JsonNode tree = Json.mapper().readTree(body);
            renames = tree == null ? List.of() : OldFieldNames.upgradeTree(tree);
        } catch (JsonProcessingException e) {
            return; // the handler's binder describes the malformed body
        }
        if (!renames.isEmpty()) {
            ctx.header(HEADER, renames.stream().map(OldFieldNames.Rename::text).collect(Collectors.joining(", ")));
        }
    }
}
