package coilwright.web;

import com.fasterxml.jackson.core.JsonProcessingException;
import coilwright.validation.FieldError;
import coilwright.service.DesignStoreUnavailableException;
import coilwright.service.EditNotAllowedException;
import coilwright.service.NoSuchDesignException;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.validation.SolverFailedException;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import io.javalin.http.HttpStatus;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.function.Function;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Every exception-to-response rule of the service, in one place. Under {@code /api/} (and for
 * {@code /health}, {@code /metrics}) the answer is RFC 9457 {@code application/problem+json}; elsewhere
 * the same problem is rendered as the HTML error page, or, when the request was handling a page form
 * ({@link FormPage}), as that form again with the user's input and each message beside its field.
 * The three typed failures of a calculation: invalid input 400, infeasible design 422, solver failure 422.
 * An unexpected exception becomes a 500 with a generic message and a log id; no stack trace or exception
 * text ever reaches the body.
 */
public final class ErrorMapping {
    private static final Logger LOG = LoggerFactory.getLogger(ErrorMapping.class);

    private ErrorMapping() {
    }

    public static void register(RoutesConfig routes) {
        register(routes, path -> List.of());
    }

    /**
     * As {@link #register(RoutesConfig)}; {@code allowedMethods} names the methods a path takes, sent as {@code Allow}
     * with every 405.
     */
    public static void register(RoutesConfig routes, Function<String, List<String>> allowedMethods) {
        routes.exception(InvalidInputException.class, (e, ctx) -> failed(ctx, 400, e.errors(),
                problem("invalid-input", 400, e.errors().size() == 1 ? "1 field is invalid."
                        : e.errors().size() + " fields are invalid.", ctx).withErrors(e.errors())));
        routes.exception(InfeasibleDesignException.class, (e, ctx) -> failed(ctx, 422, e.field(), e.getMessage(),
                problem("infeasible-design", 422, e.getMessage(), ctx).withField(e.field())));
        routes.exception(SolverFailedException.class, (e, ctx) -> failed(ctx, 422, e.field(), e.getMessage(),
                problem("solver-failed", 422, e.getMessage(), ctx).withField(e.field())));
        routes.exception(MalformedJsonException.class, (e, ctx) ->
                respond(ctx, problem("malformed-json", 400, e.getMessage(), ctx).withField(e.path())));
        routes.exception(NotFoundException.class, (e, ctx) -> respond(ctx, problem("not-found", 404, e.getMessage(), ctx)));
        routes.exception(ForbiddenException.class, (e, ctx) -> respond(ctx, problem("forbidden", 403, e.getMessage(), ctx)));
        routes.exception(NoSuchDesignException.class, (e, ctx) -> respond(ctx, problem("not-found", 404, e.getMessage(), ctx)));
        routes.exception(EditNotAllowedException.class, (e, ctx) -> failed(ctx, 403, "editToken", e.getMessage(),
                problem("forbidden", 403, e.getMessage(), ctx)));
        routes.exception(DesignStoreUnavailableException.class, (e, ctx) -> respond(ctx.header("Retry-After", "5"),
                problem("service-unavailable", 503, e.getMessage(), ctx)));
        routes.exception(coilwright.service.SizingBusyException.class, (e, ctx) -> respond(ctx.header("Retry-After",
                Integer.toString(e.retryAfterS())), problem("too-many-requests", 429, e.getMessage(), ctx)));
        routes.exception(RefusedRequestException.class, (e, ctx) -> {
            if (e.retryAfterSeconds() > 0) {
                ctx.header("Retry-After", Integer.toString(e.retryAfterSeconds()));
            }
            respond(ctx, problem(e.slug(), e.status(), e.getMessage(), ctx));
        });
        routes.exception(HttpResponseException.class, (e, ctx) -> respond(ctx, fromStatus(e.getStatus(), ctx)));
        routes.exception(Exception.class, (e, ctx) -> unexpected(e, ctx));
        routes.error(404, ctx -> respondUnlessDone(ctx, 404));
        routes.error(405, ctx -> {
            List<String> allowed = allowedMethods.apply(ctx.path());
            if (!allowed.isEmpty()) {
                ctx.header("Allow", String.join(", ", allowed));
            }
            respondUnlessDone(ctx, 405);
        });
    }

    private static void failed(Context ctx, int status, String field, String message, Problem problem) {
        failed(ctx, status, List.of(new FieldError(field, "", message, "")), problem);
    }

    /** A calculation's refusal: the page form again with messages when a page form was being handled. */
    private static void failed(Context ctx, int status, List<FieldError> errors, Problem problem) {
        java.util.Optional<FormPage> form = Route.isApiPath(ctx.path()) ? java.util.Optional.empty() : FormPage.of(ctx);
        if (form.isPresent()) {
            form.get().reject(ctx, status, errors);
        } else {
            respond(ctx, problem);
        }
    }

    private static String sentence(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static void unexpected(Exception e, Context ctx) {
        String id = UUID.randomUUID().toString().substring(0, 8);
        LOG.error("unexpected error {} on {} {}", id, ctx.method(), ctx.path(), e);
        respond(ctx, problem("internal-error", 500,
                "An unexpected error occurred. Please report it with the id " + id + ".", ctx).withId(id));
    }

    private static void respondUnlessDone(Context ctx, int status) {
        String type = ctx.res().getContentType();
        if (type == null || !(type.startsWith(Problem.MEDIA_TYPE) || type.startsWith("text/html"))) {
            respond(ctx, fromStatus(status, ctx));
        }
    }

    private static Problem fromStatus(int status, Context ctx) {
        String detail = switch (status) {
            case 404 -> "There is nothing at " + ctx.path() + ".";
            case 405 -> ctx.method().name() + " is not allowed on " + ctx.path() + ".";
            case 413 -> "The request body is larger than the limit of this service.";
            case 415 -> "The request body is not of a media type this address takes.";
            default -> HttpStatus.forStatus(status).getMessage() + ".";
        };
        return problem(slug(status), status, detail, ctx);
    }

    private static Problem problem(String slug, int status, String detail, Context ctx) {
        return Problem.of(slug, HttpStatus.forStatus(status).getMessage(), status, detail, ctx.path());
    }

    private static String slug(int status) {
        return HttpStatus.forStatus(status).getMessage().toLowerCase(java.util.Locale.ROOT).replace(' ', '-');
    }

    /** Writes the problem as JSON or as the HTML error page, by path. */
    static void respond(Context ctx, Problem problem) {
        ctx.status(problem.status());
        if (Route.isApiPath(ctx.path())) {
            try {
                // bytes, not a String: the body is UTF-8 whatever the container's default charset
                ctx.contentType(Problem.MEDIA_TYPE + ";charset=utf-8").result(Json.mapper().writeValueAsBytes(problem));
            } catch (JsonProcessingException e) {
                ctx.contentType("text/plain;charset=utf-8").result(problem.title());
            }
            return;
        }
        try {
            ctx.contentType("text/html; charset=utf-8").render("error", Map.of("problem", problem));
        } catch (RuntimeException e) {
            LOG.error("error page failed for {}", ctx.path(), e);
            ctx.contentType("text/plain; charset=utf-8").result(problem.status() + " " + problem.title());
        }
    }
}
