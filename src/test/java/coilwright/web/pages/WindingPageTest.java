package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;

import coilwright.web.TestApp;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The winding-layout page through the real app. */
class WindingPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void lays_out_twelve_slots_ten_poles_with_its_published_winding_factor() {
        // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010, table of kw1: 12 slots / 10 poles, double layer 0.933
        given().queryParam("slots", 12).queryParam("poles", 10).queryParam("layers", "DOUBLE").get("/winding")
                .then().statusCode(200)
                .body(containsString("<td>1</td><td>0.9330</td>"))
                .body(containsString("data-coil=\"12\""))
                .body(not(containsString("data-coil=\"13\"")))
                .body(containsString("Phase A"))
                .body(containsString("Cogging periods per revolution, LCM(Q, 2p)</th><td>60</td>"));
    }

    @Test
    void a_single_layer_winding_has_half_as_many_coils() {
        // source: El-Refaie 2010: 12 slots / 10 poles single layer kw1 = 0.966
        given().queryParam("slots", 12).queryParam("poles", 10).queryParam("layers", "SINGLE").get("/winding")
                .then().statusCode(200)
                .body(containsString("<td>1</td><td>0.9659</td>"))
                .body(containsString("data-coil=\"6\""))
                .body(not(containsString("data-coil=\"7\"")));
    }

    @Test
    void an_unbalanced_combination_is_a_422_with_the_reason_beside_slots() {
        given().queryParam("slots", 12).queryParam("poles", 12).get("/winding").then().statusCode(422)
                .body(containsString("id=\"slots-error\">12 slots with 12 poles"))
                .body(not(containsString("winding-diagram")));
    }

    @Test
    void invalid_numbers_are_a_400_with_messages_under_the_short_field_names() {
        given().queryParam("slots", "abc").queryParam("pitch", "-1").get("/winding").then().statusCode(400)
                .body(containsString("id=\"slots-error\">slots = &quot;abc&quot;: must be a whole number"))
                .body(containsString("value=\"abc\""));
        given().queryParam("slots", 12).queryParam("poles", 10).queryParam("pitch", 9).get("/winding").then().statusCode(400)
                .body(containsString("id=\"pitch-error\">coilPitchSlots = 9"));
    }
}
