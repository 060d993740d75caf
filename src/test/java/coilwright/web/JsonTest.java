package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class JsonTest {
    private final ObjectMapper mapper = Json.mapper();

    record Point(double speedRpm, Optional<Double> torqueNm, int poles, String label) {
    }

    record Curve(String name, double[] valuesV, List<Point> points) {
    }

    @Test
    void writes_records_in_declared_order_with_plain_doubles_and_optionals() throws Exception {
        assertEquals("{\"speedRpm\":250.5,\"torqueNm\":null,\"poles\":8,\"label\":\"a\"}",
                mapper.writeValueAsString(new Point(250.5, Optional.empty(), 8, "a")));
        assertEquals("{\"speedRpm\":1.0E-4,\"torqueNm\":12.0,\"poles\":8,\"label\":\"b\"}",
                mapper.writeValueAsString(new Point(1e-4, Optional.of(12.0), 8, "b")));
    }

    @Test
    void refuses_to_write_NaN_or_infinity_anywhere_in_a_result() {
        assertThrows(JsonProcessingException.class, () -> mapper.writeValueAsString(new Point(Double.NaN, Optional.empty(), 8, "x")));
        assertThrows(JsonProcessingException.class, () -> mapper.writeValueAsString(new Point(1, Optional.of(Double.POSITIVE_INFINITY), 8, "x")));
        assertThrows(JsonProcessingException.class, () -> mapper.writeValueAsString(new Curve("c", new double[] {1, Double.NaN}, List.of())));
        assertThrows(JsonProcessingException.class, () -> mapper.writeValueAsString(
                new Curve("c", new double[] {1}, List.of(new Point(Double.NEGATIVE_INFINITY, Optional.empty(), 2, "p")))));
    }

    @Test
    void refuses_unknown_fields_null_primitives_missing_creator_fields_and_coerced_strings() {
        assertThrows(JsonProcessingException.class, () -> mapper.readValue("{\"speedRpm\":1,\"torqueNm\":null,\"poles\":2,\"label\":\"a\",\"x\":1}", Point.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue("{\"speedRpm\":null,\"torqueNm\":null,\"poles\":2,\"label\":\"a\"}", Point.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue("{\"torqueNm\":null,\"poles\":2,\"label\":\"a\"}", Point.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue("{\"speedRpm\":\"NaN\",\"torqueNm\":null,\"poles\":2,\"label\":\"a\"}", Point.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue("{\"speedRpm\":1,\"torqueNm\":null,\"poles\":2.5,\"label\":\"a\"}", Point.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readTree("{\"speedRpm\": NaN}"));
    }
}
