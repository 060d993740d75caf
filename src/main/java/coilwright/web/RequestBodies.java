package coilwright.web;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.util.Locale;

/**
 * Checks a request body against what its route accepts ({@link Route.Body}) before the handler reads it:
 * the declared length against the limit (413), the media type (415: JSON routes take JSON, form routes take form
 * fields, multipart only where a file may be uploaded), and a multipart body is parsed here, within the same
 * limit, so a malformed one is a 400 rather than a failure inside the handler. A request without a
 * {@code Content-Type} is read as the route's own kind.
 */
public final class RequestBodies {
    private RequestBodies() {
    }

    /** The handler, preceded by the body check of its route. */
    public static Handler guard(Route route, long maxBodyBytes) {
        Handler handler = route.handler();
        if (route.body() == Route.Body.NONE) {
            return handler;
        }
        return ctx -> {
            check(ctx, route.body(), maxBodyBytes);
            handler.handle(ctx);
        };
    }

    /**
     * A before-filter for every request: a {@code Content-Type} naming a charset this JVM does not know is a 415
     * here, before anything reads the header through the container (which would throw).
     */
    public static void knownCharset(Context ctx) {
        if (ctx.header("Content-Type") == null) {
            return;
        }
        try {
            ctx.req().getContentType();
            ctx.req().getCharacterEncoding();
        } catch (RuntimeException e) {
            throw new RefusedRequestException(415, "unsupported-charset",
                    "The charset named in the Content-Type is not one this service reads; send the body in UTF-8.");
        }
    }

    static void check(Context ctx, Route.Body accepts, long maxBodyBytes) {
        long declared = ctx.req().getContentLengthLong();
        if (declared > maxBodyBytes) {
            throw tooLarge(maxBodyBytes);
        }
        String type = mediaType(ctx.header("Content-Type"));
        if (type.startsWith("multipart/")) {
            if (!accepts.takesUploads()) {
                throw unsupported(accepts);
            }
            parseMultipart(ctx, maxBodyBytes);
            return;
        }
        boolean json = accepts == Route.Body.JSON || accepts == Route.Body.JSON_OR_UPLOAD;
        boolean fits = type.isEmpty()
                || (json ? type.equals("application/json") || (type.startsWith("application/") && type.endsWith("+json"))
                         : type.equals("application/x-www-form-urlencoded"));
        if (!fits) {
            throw unsupported(accepts);
        }
    }

    private static void parseMultipart(Context ctx, long maxBodyBytes) {
        try {
            ctx.formParamMap();
            ctx.uploadedFiles();
        } catch (Exception e) { // the container's ServletException arrives unchecked through Kotlin
            if (mentionsSize(e)) {
                throw tooLarge(maxBodyBytes);
            }
            throw new RefusedRequestException(400, "malformed-multipart",
                    "The multipart body could not be read: give a boundary in the Content-Type and separate each part"
                            + " with it, or send the design file as a JSON body instead.");
        }
    }

    private static boolean mentionsSize(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String m = t.getMessage() == null ? "" : t.getMessage().toLowerCase(Locale.ROOT);
            if (m.contains("413") || m.contains("too large") || m.contains("exceeds") || m.contains("max")) {
                return true;
            }
        }
        return false;
    }

    private static RefusedRequestException tooLarge(long maxBodyBytes) {
        return new RefusedRequestException(413, "content-too-large",
                "The request body is larger than the limit of " + maxBodyBytes + " bytes.");
    }

    private static RefusedRequestException unsupported(Route.Body accepts) {
        String wanted = switch (accepts) {
            case JSON -> "a JSON body with Content-Type: application/json";
            case JSON_OR_UPLOAD -> "a JSON body with Content-Type: application/json, or a multipart/form-data upload with"
                    + " the design file in the part named file";
            case FORM -> "form fields (application/x-www-form-urlencoded)";
            case FORM_OR_UPLOAD -> "form fields (application/x-www-form-urlencoded or multipart/form-data)";
            case NONE -> "no body";
        };
        return new RefusedRequestException(415, "unsupported-media-type", "This address takes " + wanted + ".");
    }

    /** The media type without parameters, in lower case; empty when none was given. */
    static String mediaType(String contentType) {
        if (contentType == null) {
            return "";
        }
        int semi = contentType.indexOf(';');
        return (semi < 0 ? contentType : contentType.substring(0, semi)).strip().toLowerCase(Locale.ROOT);
    }
}
