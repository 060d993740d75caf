package coilwright.web;

import io.javalin.http.Handler;
import io.javalin.http.HandlerType;

/**
 * One entry of the route table in {@code App}: the table both registers the routes and lists them
 * (the OpenAPI contract test compares it with the document).
 *
 * @param method HTTP method
 * @param path   Javalin path, e.g. {@code /api/v1/designs/{id}} (same braces as OpenAPI)
 * @param handler a thin handler
 */
public record Route(HandlerType method, String path, Handler handler) {
    public static Route get(String path, Handler handler) {
        return new Route(HandlerType.GET, path, handler);
    }

    public static Route post(String path, Handler handler) {
        return new Route(HandlerType.POST, path, handler);
    }

    public static Route delete(String path, Handler handler) {
        return new Route(HandlerType.DELETE, path, handler);
    }

    /** True for JSON routes: errors there are problem+json, elsewhere an HTML error page. */
    public static boolean isApiPath(String path) {
        return path.startsWith("/api/") || path.equals("/health") || path.equals("/metrics");
    }
}
