package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.hamcrest.Matchers.startsWith;

import coilwright.validation.SolverFailedException;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The page side of the infrastructure: a form opened with {@link FormPage} and bound with {@link FormBinder}; a
 * refusal thrown anywhere in the handler comes back, through {@link ErrorMapping}, as the same form with the text
 * as typed and each message beside its field.
 */
class PagesTest {
    private static final FormBinder FORMS = new FormBinder(new RecordBinder(Json.mapper()));
    private static final List<Choice> GRADES = Choice.names(SampleDesign.Grade.values());

    private static Map<String, Object> model(FormResult form) {
        return new HashMap<>(Map.of("form", form, "grades", GRADES));
    }

    private static void showForm(Context ctx) {
        ctx.render("test-form", model(FormResult.showing(Map.of("name", "rig", "rotor.poles", "8"))));
    }

    private static void postForm(Context ctx) {
        FormPage.open(ctx, "test-form", FormPage.posted(ctx), PagesTest::model);
        SampleDesign design = FORMS.bind(ctx.formParamMap(), SampleDesign.class);
        if (design.rotor().poles() == 98) {
            throw new SolverFailedException("rotor.poles", "the solver gave up at 98 poles: use fewer");
        }
        Map<String, Object> m = model(FormResult.showing(FormPage.posted(ctx)));
        m.put("result", design);
        ctx.render("test-form", m);
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
        Html page = Html.of(given().get("/test/form").then().statusCode(200).contentType(startsWith("text/html"))
                .extract().response());
        assertEquals("8", page.value("rotor.poles"));
        assertEquals("m", page.unit("rotor.airGapM"));
        assertEquals(List.of("N35", "N42", "N52"), page.options("rotor.magnet.grade"));
        assertTrue(page.all(".error-summary").isEmpty());
    }

    @Test
    void imperial_choice_changes_the_unit_beside_the_field() {
        Html page = Html.of(given().queryParam("units", "imperial").get("/test/form").then().statusCode(200)
                .extract().response());
        assertEquals("ft", page.unit("rotor.airGapM"));
    }

    @Test
    void a_valid_post_binds_the_record() {
        Html page = Html.of(given().formParams(validForm()).post("/test/form").then().statusCode(200).extract().response());
        assertEquals("Bound: 8 poles, air gap 0.002 m", page.id("result").text());
        assertEquals("N42", page.selected("rotor.magnet.grade"));
    }

    @Test
    void an_invalid_post_comes_back_with_messages_beside_the_fields_and_what_was_typed() {
        Map<String, String> f = validForm();
        f.put("rotor.poles", "7");
        f.put("stator.coils[0].turns", "abc");
        Html page = Html.of(given().formParams(f).post("/test/form").then().statusCode(400)
                .contentType(startsWith("text/html")).extract().response());
        assertEquals("rotor.poles = 7: must be even", page.error("rotor.poles"));
        assertEquals("stator.coils[0].turns = \"abc\": must be a whole number", page.error("stator.coils[0].turns"));
        assertTrue(page.id("rotor.poles").parent().hasClass("invalid"));
        assertEquals("abc", page.value("stator.coils[0].turns"));
        assertEquals("0.002", page.value("rotor.airGapM"), "valid entries stay as typed too");
        assertEquals(2, page.summary().size());
        assertFalse(page.has("result"));
    }

    @Test
    void an_infeasible_post_is_a_422_with_the_reason_beside_its_field() {
        Map<String, String> f = validForm();
        f.put("stator.slots", "10");
        Html page = Html.of(given().formParams(f).post("/test/form").then().statusCode(422).extract().response());
        assertTrue(page.error("stator.slots").contains("cannot carry a balanced"), page.error("stator.slots"));
        assertEquals("10", page.value("stator.slots"));
    }

    @Test
    void a_solver_failure_is_a_422_with_its_message_beside_its_field() {
        Map<String, String> f = validForm();
        f.put("rotor.poles", "98");
        Html page = Html.of(given().formParams(f).post("/test/form").then().statusCode(422).extract().response());
        assertEquals("the solver gave up at 98 poles: use fewer", page.error("rotor.poles"));
        assertEquals("98", page.value("rotor.poles"));
    }
}
