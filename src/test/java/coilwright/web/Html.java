package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertNotNull;

import io.restassured.response.Response;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;

/** A served page parsed into elements (jsoup), with the look-ups page tests share. */
public final class Html {
    private final Document doc;

    private Html(Document doc) {
        this.doc = doc;
    }

    public static Html of(Response response) {
        return new Html(Jsoup.parse(response.asString()));
    }

    public static Html of(String html) {
        return new Html(Jsoup.parse(html));
    }

    public Document doc() {
        return doc;
    }

    /** The element with this id (ids may hold dots and brackets: no CSS escaping needed); fails when absent. */
    public Element id(String id) {
        Element e = doc.getElementById(id);
        assertNotNull(e, "no element with id " + id);
        return e;
    }

    public boolean has(String id) {
        return doc.getElementById(id) != null;
    }

    /** Elements matching a CSS selector. */
    public Elements all(String css) {
        return doc.select(css);
    }

    /** The value a form field shows. */
    public String value(String field) {
        return id(field).val();
    }

    /** The message beside a field, or an empty string when it has none. */
    public String error(String field) {
        Element e = doc.getElementById(field + "-error");
        return e == null ? "" : e.text();
    }

    /** The selected option's value of a select. */
    public String selected(String field) {
        Element option = id(field).selectFirst("option[selected]");
        return option == null ? "" : option.val();
    }

    /** The option values of a select, in order. */
    public List<String> options(String field) {
        return id(field).select("option").eachAttr("value");
    }

    /** The unit shown beside a field. */
    public String unit(String field) {
        Element unit = id(field).parent().selectFirst(".unit");
        return unit == null ? "" : unit.text();
    }

    /** The messages of the error summary at the top of a form (empty when the form has none). */
    public List<String> summary() {
        return doc.select(".error-summary li").eachText();
    }

    /** The whole visible text. */
    public String text() {
        return doc.body().text();
    }
}
