package coilwright.web.api;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

class CatalogueApiTest {
    private static final String PATH = "/api/v1/catalogue";

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void the_catalogue_matches_its_documented_schema() {
        Response r = given().get(PATH);
        OpenApiContract.assertMatches(r, PATH, "GET");
        r.then().statusCode(200).contentType(startsWith("application/json"));
    }

    @Test
    void wire_sizes_follow_the_ASTM_B258_diameters() {
        // source: ASTM B258, d = 0.127 mm * 92^((36 - n)/39): AWG 14 = 1.628 mm, AWG 18 = 1.024 mm, AWG 20 = 0.812 mm
        given().get(PATH).then().statusCode(200)
                .body("awgSizes.find { it.awg == 14 }.bareDiameterM", closeTo(1.628e-3, 0.001e-3))
                .body("awgSizes.find { it.awg == 18 }.bareDiameterM", closeTo(1.024e-3, 0.001e-3))
                .body("awgSizes.find { it.awg == 20 }.bareDiameterM", closeTo(0.812e-3, 0.001e-3))
                .body("awgSizes.find { it.awg == 14 }.copperAreaM2", closeTo(Math.PI / 4 * 1.6277e-3 * 1.6277e-3, 1e-9))
                .body("awgSizes.find { it.awg == 14 }.label", equalTo("AWG 14"));
    }

    @Test
    void every_wire_is_larger_over_its_insulation_than_bare() {
        JsonPath json = given().get(PATH).then().statusCode(200).extract().jsonPath();
        List<Map<String, Object>> wires = json.getList("awgSizes");
        wires.addAll(json.getList("metricSizes"));
        assertTrue(wires.size() > 40, "both series are listed: " + wires.size());
        for (Map<String, Object> w : wires) {
            double bare = ((Number) w.get("bareDiameterM")).doubleValue();
            double overall = ((Number) w.get("overallDiameterM")).doubleValue();
            assertTrue(overall > bare && bare > 0, w.toString());
        }
    }

    @Test
    void insulation_classes_carry_the_IEC_60085_limits() {
        // source: IEC 60085 thermal classes A 105, E 120, B 130, F 155, H 180 C
        given().get(PATH).then().statusCode(200)
                .body("insulationClasses.name", contains("A", "E", "B", "F", "H"))
                .body("insulationClasses.limitC", contains(105.0, 120.0, 130.0, 155.0, 180.0));
    }

    @Test
    void magnet_grades_include_NdFeB_with_temperature_suffixes_and_ferrite() {
        given().get(PATH).then().statusCode(200)
                .body("magnetGrades.name", hasItems("N35", "N42", "N52", "N42SH", "N35UH", "Ferrite C8"))
                // common practice: sintered N42 has Br about 1.28 to 1.32 T at 20 C in makers' data sheets
                .body("magnetGrades.find { it.name == 'N42' }.remanenceT", closeTo(1.30, 0.02))
                .body("magnetGrades.find { it.name == 'N42SH' }.maxWorkingTempC",
                        greaterThan(given().get(PATH).jsonPath().getDouble("magnetGrades.find { it.name == 'N42' }.maxWorkingTempC")));
    }

    @Test
    void battery_chemistries_cooling_bands_and_diodes_are_listed() {
        given().get(PATH).then().statusCode(200)
                .body("batteryChemistries.chemistry", contains("LEAD_ACID", "LIFEPO4"))
                // common practice: lead-acid 2.0 V per cell nominal, LiFePO4 3.2 V
                .body("batteryChemistries.find { it.chemistry == 'LEAD_ACID' }.nominalCellV", closeTo(2.0, 1e-9))
                .body("batteryChemistries.find { it.chemistry == 'LIFEPO4' }.nominalCellV", closeTo(3.2, 1e-9))
                .body("cooling.name", hasItems("ENCLOSED_NATURAL", "AIR_COOLED_AXIAL_OPEN_COIL"))
                .body("diodes.name", contains("SILICON", "SCHOTTKY"));
        JsonPath json = given().get(PATH).jsonPath();
        for (Map<String, Object> band : json.<Map<String, Object>>getList("cooling")) {
            assertTrue(((Number) band.get("lowAPerMm2")).doubleValue() < ((Number) band.get("highAPerMm2")).doubleValue(),
                    band.toString());
        }
    }
}
