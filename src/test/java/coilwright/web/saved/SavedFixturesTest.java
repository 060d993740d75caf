package coilwright.web.saved;

import coilwright.web.TestApp;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import static io.restassured.RestAssured.given;

/**
 * The slow crash and two-instance loops save the example with many turns-per-coil values; each must be a design the
 * service accepts, or those loops report "lost" saves that were really refused. Checked here, in the fast phase.
 */
class SavedFixturesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void every_turns_value_the_loops_use_is_accepted() {
        for (int k = 0; k < SavedFixtures.LOOP_TURNS_CHOICES; k++) {
            int turns = SavedFixtures.loopTurns(k);
            given().contentType("application/json").body(SavedFixtures.document("turns " + turns, "", turns))
                    .post("/api/v1/designs").then().statusCode(201);
        }
    }

    @Test
    void the_first_turns_value_past_the_range_overfills_the_window_so_the_range_is_not_needlessly_narrow() {
        given().contentType("application/json").body(SavedFixtures.document("too many", "", 43))
                .post("/api/v1/designs").then().statusCode(422);
    }
}
