package coilwright.web.match;

import coilwright.web.TestApp;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A hydro match request that once answered 500 ("bridge solver: no periodic solution after 60 Newton steps",
 * residual 7.1e-7 A): the radial hydro alternator in delta behind 80 m of AC cable, a 28 m head and a two-jet
 * impulse runner, with a flow-duration table down to 0.010352 m^3/s. The body is posted byte for byte.
 */
class HydroMatch500RegressionTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static String body() throws IOException {
        try (InputStream in = HydroMatch500RegressionTest.class.getClassLoader()
                .getResourceAsStream("repro/hydro-500.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void the_recorded_hydro_request_is_matched_with_a_sensible_result() throws IOException {
        Response r = given().contentType("application/json").body(body()).post("/api/v1/match/hydro");
        assertEquals(200, r.statusCode(), r.asString());
        double batteryW = r.jsonPath().getDouble("matched.powerToBatteryW");
        double shaftW = r.jsonPath().getDouble("matched.alternatorShaftPowerW");
        double hydraulicW = r.jsonPath().getDouble("hydraulicPowerW");
        double annualKWh = r.jsonPath().getDouble("annualEnergyKWh");
        assertTrue(batteryW > 0 && batteryW < shaftW && shaftW < hydraulicW,
                () -> "battery " + batteryW + " W, shaft " + shaftW + " W, hydraulic " + hydraulicW + " W");
        // the stream never falls below 0.010352 m^3/s (86 % of the design flow): the year yields between 86 % and
        // 100 % of a year at the design point
        double designYearKWh = batteryW * 8760 / 1000;
        assertTrue(annualKWh > 0.8 * designYearKWh && annualKWh <= 1.0 + 1e-9 * designYearKWh + designYearKWh,
                () -> "annual " + annualKWh + " kWh against " + designYearKWh + " kWh at the design flow all year");
    }
}
