package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;

import io.javalin.http.Context;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The page side of the infrastructure: a form through FormBinder, re-rendered with messages beside fields. */
class PagesTest {
    private static final FormBinder FORMS = new FormBinder(new RecordBinder(Json.mapper()));
    private static final List<String> GRADES = Arrays.stream(SampleDesign.Grade.values()).map(Enum::name).toList();

    private static void showForm(Context ctx) {
        ctx.render("test-form", Map.of("form", FormResult.showing(Map.of("name", "rig", "rotor.poles", "8")), "grades", GRADES));
    }

    private static void postForm(Context ctx) {
        FormResult<SampleDesign> form = FORMS.bind(ctx.formParamMap(), SampleDesign.class);
        Map<String, Object> model = new HashMap<>(Map.of("form", form, "grades", GRADES));
        form.record().ifPresent(d -> model.put("result", d));
        ctx.status(form.valid() ? 200 : 400).render("test-form", model);
    }

    @RegisterExtension
    static final TestApp APP = new TestApp().withRoutes(Route.get("/test/form", PagesTest::showForm),
            Route.post("/test/form", PagesTest::postForm));

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Map<String, String> validForm() {
        Map<String, String> f = new HashMap<>();
        f.put("name", "rig");
        f.put("rotor.airGapM", "0.002");
        f.put("rotor.poles", "8");
        f.put("rotor.magnet.grade", "N42");
        f.put("rotor.magnet.thicknessM", "0.01");
        f.put("stator.slots", "12");
        f.put("stator.coils[0].turns", "40");
        f.put("stator.coils[0].wireDiameterMm", "1.0");
        return f;
    }

    @Test
    void an_empty_form_renders_with_defaults_and_units() {
        given().get("/test/form").then().statusCode(200).contentType(startsWith("text/html"))
                .body(containsString("id=\"rotor.poles\" name=\"rotor.poles\" value=\"8\""))
                .body(containsString("<span class=\"unit\">m</span>"))
                .body(not(containsString("error-summary")));
    }

    @Test
    void imperial_choice_changes_the_unit_beside_the_field() {
        given().queryParam("units", "imperial").get("/test/form").then().statusCode(200)
                .body(containsString("<span class=\"unit\">ft</span>"));
    }

    @Test
    void a_valid_post_binds_the_record() {
        given().formParams(validForm()).post("/test/form").then().statusCode(200)
                .body(containsString("Bound: 8 poles, air gap 0.002 m"));
    }

    @Test
    void an_invalid_post_comes_back_with_messages_beside_the_fields_and_what_was_typed() {
        Map<String, String> f = validForm();
        f.put("rotor.poles", "7");
        f.put("stator.coils[0].turns", "abc");
        given().formParams(f).post("/test/form").then().statusCode(400)
                .body(containsString("class=\"field invalid\""))
                .body(containsString("rotor.poles = 7: must be even"))
                .body(containsString("stator.coils[0].turns = &quot;abc&quot;: must be a whole number"))
                .body(containsString("value=\"abc\""))
                .body(containsString("Please correct the marked fields"));
    }
}
