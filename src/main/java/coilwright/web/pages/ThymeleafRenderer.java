package coilwright.web.pages;

import coilwright.web.units.Fmt;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import io.javalin.rendering.FileRenderer;
import java.util.Locale;
import java.util.Map;
import org.thymeleaf.TemplateEngine;
import org.thymeleaf.context.IExpressionContext;
import org.thymeleaf.linkbuilder.StandardLinkBuilder;
import org.thymeleaf.templatemode.TemplateMode;
import org.thymeleaf.templateresolver.ClassLoaderTemplateResolver;

/**
 * Javalin's {@link FileRenderer} over Thymeleaf: {@code ctx.render("home", model)} renders the classpath
 * template {@code templates/home.html}. Every page also gets {@code path} (the request path, for the nav),
 * {@code here} (the address the units switch adds its choice to, {@link UnitsSwitch}; a model's own
 * {@code unitsLink} wins), {@code units} (the request's {@link Units}) and {@code fmt} (numbers in those units, {@link Fmt}).
 */
public final class ThymeleafRenderer implements FileRenderer {
    private final TemplateEngine engine = new TemplateEngine();

    public ThymeleafRenderer() {
        ClassLoaderTemplateResolver resolver = new ClassLoaderTemplateResolver(ThymeleafRenderer.class.getClassLoader());
        resolver.setPrefix("templates/");
        resolver.setSuffix(".html");
        resolver.setTemplateMode(TemplateMode.HTML);
        resolver.setCharacterEncoding("UTF-8");
        resolver.setCacheable(true);
        engine.setTemplateResolver(resolver);
        engine.setLinkBuilder(new RootContextLinks());
    }

    /** Lets {@code @{/path(q=v)}} links work without a servlet context: the app is served at the root. */
    private static final class RootContextLinks extends StandardLinkBuilder {
        @Override
        protected String computeContextPath(IExpressionContext context, String base, Map<String, Object> parameters) {
            return "";
        }
    }

    @Override
    public String render(String filePath, Map<String, ?> model, Context ctx) {
        return render(filePath, model, ctx.path(), UnitsSwitch.here(ctx), Units.of(ctx));
    }

    /** As a request for {@code path} (its own address {@code here}) in {@code units} would render it. */
    public String render(String filePath, Map<String, ?> model, String path, String here, Units units) {
        org.thymeleaf.context.Context page = new org.thymeleaf.context.Context(Locale.ROOT);
        page.setVariables(new java.util.HashMap<>(model));
        page.setVariable("path", path);
        page.setVariable("here", here);
        page.setVariable("words", coilwright.web.Words.INSTANCE);
        page.setVariable("units", units);
        page.setVariable("fmt", new Fmt(units));
        return render(filePath, page);
    }

    /** Renders without a request (tests, exports). */
    public String render(String template, org.thymeleaf.context.Context page) {
        String name = template.endsWith(".html") ? template.substring(0, template.length() - 5) : template;
        return engine.process(name, page);
    }
}
