package coilwright.web;

import coilwright.web.units.Quantity;
import coilwright.web.units.Units;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import java.math.BigDecimal;
import java.math.BigInteger;

/** One entered text as the JSON value its field needs; unreadable numbers stay text so the binder names them. */
final class FormText {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private FormText() {
    }

    static JsonNode toNode(String text, Class<?> raw, Units units, Quantity quantity) {
        boolean whole = raw == int.class || raw == Integer.class || raw == long.class || raw == Long.class;
        boolean decimal = raw == double.class || raw == Double.class || raw == float.class || raw == Float.class;
        if (whole) {
            try {
                return NODES.numberNode(new BigInteger(text));
            } catch (NumberFormatException e) {
                return decimalOrText(text);
            }
        }
        if (decimal) {
            JsonNode n = decimalOrText(text);
            if (n.isNumber() && quantity != null && units == Units.IMPERIAL) {
                return NODES.numberNode(units.enter(quantity, n.doubleValue()));
            }
            return n;
        }
        return NODES.textNode(text);
    }

    private static JsonNode decimalOrText(String text) {
        try {
            return NODES.numberNode(new BigDecimal(text));
        } catch (NumberFormatException e) {
            return NODES.textNode(text);
        }
    }
}
