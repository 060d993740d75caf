package coilwright.web;

import io.javalin.http.Handler;
import io.javalin.http.HandlerType;
import java.util.regex.Pattern;

/**
 * One entry of the route table in {@code App}: the table both registers the routes and lists them
 * (the OpenAPI contract test compares it with the document).
 *
 * @param method  HTTP method
 * @param path    Javalin path, e.g. {@code /api/v1/designs/{id}} (same braces as OpenAPI)
 * @param handler a thin handler
 * @param body    what request body the route accepts ({@link RequestBodies} refuses anything else)
 */
public record Route(HandlerType method, String path, Handler handler, Body body) {
    /** The request bodies a route accepts. */
    public enum Body {
        /** No body is read (GET). */
        NONE(false),
        /** A JSON document ({@code application/json} or {@code application/*+json}). */
        JSON(false),
        /** HTML form fields ({@code application/x-www-form-urlencoded}). */
        FORM(false),
        /** A JSON document, or a multipart upload with a {@code file} part. */
        JSON_OR_UPLOAD(true),
        /** HTML form fields, or a multipart form with a {@code file} part. */
        FORM_OR_UPLOAD(true);

        private final boolean uploads;

        Body(boolean uploads) {
            this.uploads = uploads;
        }

        public boolean takesUploads() {
            return uploads;
        }
    }

    public Route {
        body = body == null ? Body.NONE : body;
    }

    public Route(HandlerType method, String path, Handler handler) {
        this(method, path, handler, method == HandlerType.POST ? (isApiPath(path) ? Body.JSON : Body.FORM) : Body.NONE);
    }

    public static Route get(String path, Handler handler) {
        return new Route(HandlerType.GET, path, handler);
    }

    /** A POST route: a JSON body under {@code /api/}, form fields elsewhere. */
    public static Route post(String path, Handler handler) {
        return new Route(HandlerType.POST, path, handler);
    }

    public static Route delete(String path, Handler handler) {
        return new Route(HandlerType.DELETE, path, handler);
    }

    /** The same route, also accepting a multipart upload (a design file). */
    public Route withUploads() {
        return new Route(method, path, handler, body == Body.JSON ? Body.JSON_OR_UPLOAD : Body.FORM_OR_UPLOAD);
    }

    /** True when a request path falls on this route's path template ({@code {x}} matches one segment). */
    public boolean matches(String requestPath) {
        return pattern().matcher(requestPath).matches();
    }

    private Pattern pattern() {
        StringBuilder regex = new StringBuilder();
        for (String part : path.split("(?=\\{)|(?<=\\})")) {
            regex.append(part.startsWith("{") && part.endsWith("}") ? "[^/]+" : Pattern.quote(part));
        }
        return Pattern.compile(regex.toString());
    }

    /** True for JSON routes: errors there are problem+json, elsewhere an HTML error page. */
    public static boolean isApiPath(String path) {
        return path.startsWith("/api/") || path.equals("/health") || path.equals("/metrics");
    }
}
