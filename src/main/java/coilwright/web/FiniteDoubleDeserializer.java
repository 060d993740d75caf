package coilwright.web;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.deser.std.StdScalarDeserializer;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import java.io.IOException;

/**
 * Reads a double only from a JSON number, and only a finite one. Jackson's own reader accepts the
 * strings "NaN" and "Infinity" whatever the coercion settings, and turns 1e400 into infinity.
 */
final class FiniteDoubleDeserializer extends StdScalarDeserializer<Double> {
    private final boolean primitive;

    FiniteDoubleDeserializer(boolean primitive) {
        super(primitive ? Double.TYPE : Double.class);
        this.primitive = primitive;
    }

    @Override
    public Double deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
        JsonToken t = p.currentToken();
        if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
            throw MismatchedInputException.from(p, Double.class, "a number is required, not " + t);
        }
        double v = p.getDoubleValue();
        if (!Double.isFinite(v)) {
            throw InvalidFormatException.from(p, "a finite number is required", p.getText(), Double.class);
        }
        return v;
    }

    @Override
    public Double getNullValue(DeserializationContext ctxt) {
        if (primitive) {
            throw new IllegalArgumentException("null is not a number");
        }
        return null;
    }
}
