package coilwright.web;

import coilwright.validation.FieldError;
import io.javalin.http.Context;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.UnaryOperator;

/**
 * The page form a request is handling, remembered on the request so that a rejection can show it again. A page
 * handler opens it before binding and then neither catches nor checks: when binding or the calculation throws a
 * typed failure, {@link ErrorMapping} renders the same template with the text as typed and each message beside its
 * field ({@link #reject}), with the API's status (400 invalid, 422 infeasible or solver failure).
 *
 * @param template the page's template
 * @param typed    the fields as the user entered them
 * @param model    the page's model around a form (the choices of its selects, the other forms of the page)
 * @param onForm   the form field a request path belongs to (identity when the form uses the request's own paths)
 */
public record FormPage(String template, Map<String, String> typed, Function<FormResult, Map<String, Object>> model,
                       UnaryOperator<String> onForm) {
    private static final String KEY = FormPage.class.getName();

    public FormPage {
        typed = Map.copyOf(typed);
    }

    /** Remembers the form on the request; fields keep the request's own paths. */
    public static FormPage open(Context ctx, String template, Map<String, String> typed,
                                Function<FormResult, Map<String, Object>> model) {
        return open(ctx, new FormPage(template, typed, model, UnaryOperator.identity()));
    }

    /** Remembers the form on the request. */
    public static FormPage open(Context ctx, FormPage page) {
        ctx.attribute(KEY, page);
        return page;
    }

    /** The first value of each posted field, trimmed. */
    public static Map<String, String> posted(Context ctx) {
        return firstValues(ctx.formParamMap());
    }

    static Map<String, String> firstValues(Map<String, List<String>> fields) {
        Map<String, String> typed = new java.util.LinkedHashMap<>();
        fields.forEach((k, v) -> typed.put(k, v.isEmpty() ? "" : v.get(0).trim()));
        return typed;
    }

    /** The same page with another mapping from request paths to its fields. */
    public FormPage withFields(UnaryOperator<String> fieldOnForm) {
        return new FormPage(template, typed, model, fieldOnForm);
    }

    /** The form the request opened, if any. */
    static Optional<FormPage> of(Context ctx) {
        return Optional.ofNullable(ctx.attribute(KEY));
    }

    /** Shows the form again with these messages beside their fields. */
    void reject(Context ctx, int status, List<FieldError> errors) {
        FieldErrors onPage = FieldErrors.of(errors.stream()
                .map(e -> new FieldError(onForm.apply(e.field()), e.value(), e.message(), e.allowed())).toList());
        ctx.status(status).render(template, model.apply(new FormResult(onPage, typed)));
    }
}
