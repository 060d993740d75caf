package coilwright.web;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.cfg.CoercionAction;
import com.fasterxml.jackson.databind.cfg.CoercionInputShape;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.type.LogicalType;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import coilwright.service.OldFieldNames;
import com.fasterxml.jackson.databind.BeanDescription;
import com.fasterxml.jackson.databind.DeserializationConfig;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.deser.BeanDeserializerModifier;
import com.fasterxml.jackson.databind.deser.std.DelegatingDeserializer;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;

/**
 * The one Jackson configuration of the service. Strict on input (unknown fields, nulls for primitives,
 * missing creator properties, trailing tokens, duplicate keys, NaN/Infinity tokens and strings coerced to
 * numbers are all refused) and on output: a non-finite double can never be written, the attempt fails
 * loudly (HTTP 500, visible in tests) instead of producing {@code NaN} or a quoted "NaN".
 */
public final class Json {
    /** The property that names the variant of a sealed input or result type (its record's simple name). */
    public static final String TYPE_PROPERTY = "type";

    /** The sealed types of the core that travel as JSON; each variant is written with {@link #TYPE_PROPERTY}. */
    static final java.util.List<Class<?>> SEALED_TYPES = java.util.List.of(
            coilwright.magnet.RotorSpec.class, coilwright.machine.StatorSpec.class, coilwright.load.Load.class,
            coilwright.turbine.PowerCoefficientCurve.class, coilwright.turbine.FurlingControl.class,
            coilwright.sizing.Drive.class, coilwright.sizing.Build.class);

    private static final ObjectMapper MAPPER = create();

    private Json() {
    }

    /** The shared, thread-safe mapper. */
    public static ObjectMapper mapper() {
        return MAPPER;
    }

    /** A freshly configured mapper (tests; normal code uses {@link #mapper()}). */
    public static ObjectMapper create() {
        SimpleModule finiteOnly = new SimpleModule("finite-numbers-only");
        finiteOnly.addSerializer(Double.class, new FiniteDoubleSerializer());
        finiteOnly.addSerializer(Double.TYPE, new FiniteDoubleSerializer());
        finiteOnly.addSerializer(Float.class, new FiniteFloatSerializer());
        finiteOnly.addSerializer(Float.TYPE, new FiniteFloatSerializer());
        finiteOnly.addSerializer(double[].class, new FiniteDoubleArraySerializer());
        finiteOnly.addSerializer(org.apache.commons.math3.fraction.Fraction.class, new FractionSerializer());
        finiteOnly.addDeserializer(Double.class, new FiniteDoubleDeserializer(false));
        finiteOnly.addDeserializer(Double.TYPE, new FiniteDoubleDeserializer(true));
        finiteOnly.setDeserializerModifier(new OldNamesFirst());
        JsonMapper.Builder builder = JsonMapper.builder();
        for (Class<?> sealed : SEALED_TYPES) {
            builder.addMixIn(sealed, TypedVariant.class);
            builder.registerSubtypes(sealed.getPermittedSubclasses());
        }
        return builder
                .addModule(new Jdk8Module())
                .addModule(finiteOnly)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_MISSING_CREATOR_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
                .disable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
                .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
                .disable(JsonWriteFeature.WRITE_NAN_AS_STRINGS)
                .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
                .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
                .withCoercionConfig(LogicalType.Float, c -> c.setCoercion(CoercionInputShape.String, CoercionAction.Fail))
                .withCoercionConfig(LogicalType.Integer, c -> c.setCoercion(CoercionInputShape.String, CoercionAction.Fail))
                .build();
    }

    /**
     * Lets stored designs written under replaced input names bind for ever ({@link OldFieldNames}): the object of a
     * renamed record is read as a tree, rewritten to the current names, then bound as usual.
     */
    private static final class OldNamesFirst extends BeanDeserializerModifier {
        @Override
        public JsonDeserializer<?> modifyDeserializer(DeserializationConfig config, BeanDescription description,
                                                      JsonDeserializer<?> deserializer) {
            Class<?> type = description.getBeanClass();
            return OldFieldNames.renamed(type) ? new Rewriting(deserializer, type) : deserializer;
        }
    }

    private static final class Rewriting extends DelegatingDeserializer {
        private final Class<?> type;

        Rewriting(JsonDeserializer<?> delegate, Class<?> type) {
            super(delegate);
            this.type = type;
        }

        @Override
        protected JsonDeserializer<?> newDelegatingInstance(JsonDeserializer<?> delegate) {
            return new Rewriting(delegate, type);
        }

        @Override
        public Object deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            JsonNode tree = ctxt.readTree(p);
            if (tree instanceof ObjectNode object) {
                OldFieldNames.upgrade(type, object);
            }
            try (JsonParser rewritten = tree.traverse(p.getCodec())) {
                rewritten.nextToken();
                return _delegatee.deserialize(rewritten, ctxt);
            }
        }
    }

    /** Writes a fraction such as slots per pole per phase as text, {@code "2/5"}. */
    private static final class FractionSerializer extends StdSerializer<org.apache.commons.math3.fraction.Fraction> {
        FractionSerializer() {
            super(org.apache.commons.math3.fraction.Fraction.class);
        }

        @Override
        public void serialize(org.apache.commons.math3.fraction.Fraction value, JsonGenerator gen, SerializerProvider provider)
                throws IOException {
            gen.writeString(value.getDenominator() == 1 ? Integer.toString(value.getNumerator())
                    : value.getNumerator() + "/" + value.getDenominator());
        }
    }

    /** Writes a sealed type's variant name beside its fields. */
    @com.fasterxml.jackson.annotation.JsonTypeInfo(use = com.fasterxml.jackson.annotation.JsonTypeInfo.Id.SIMPLE_NAME,
            include = com.fasterxml.jackson.annotation.JsonTypeInfo.As.PROPERTY, property = TYPE_PROPERTY)
    private interface TypedVariant {
    }

    /** Thrown when a result holds NaN or an infinity: a bug in the calculation, never valid output. */
    static JsonMappingException nonFinite(JsonGenerator gen, double value) {
        return JsonMappingException.from(gen, "refusing to write a non-finite number (" + value + ") at "
                + gen.getOutputContext().pathAsPointer());
    }

    private static final class FiniteDoubleSerializer extends StdSerializer<Double> {
        FiniteDoubleSerializer() {
            super(Double.class);
        }

        @Override
        public void serialize(Double value, JsonGenerator gen, SerializerProvider provider) throws IOException {
            if (!Double.isFinite(value)) {
                throw nonFinite(gen, value);
            }
            gen.writeNumber(value);
        }
    }

    private static final class FiniteFloatSerializer extends StdSerializer<Float> {
        FiniteFloatSerializer() {
            super(Float.class);
        }

        @Override
        public void serialize(Float value, JsonGenerator gen, SerializerProvider provider) throws IOException {
            if (!Float.isFinite(value)) {
                throw nonFinite(gen, value);
            }
            gen.writeNumber(value);
        }
    }

    private static final class FiniteDoubleArraySerializer extends StdSerializer<double[]> {
        FiniteDoubleArraySerializer() {
            super(double[].class);
        }

        @Override
        public void serialize(double[] values, JsonGenerator gen, SerializerProvider provider) throws IOException {
            gen.writeStartArray(values, values.length);
            for (double v : values) {
                if (!Double.isFinite(v)) {
                    throw nonFinite(gen, v);
                }
                gen.writeNumber(v);
            }
            gen.writeEndArray();
        }
    }
}
