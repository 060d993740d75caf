package coilwright.web;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.json.JsonMapper;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.reflect.Type;

/**
 * Javalin's JSON mapper over {@link Json#mapper()}. Serialises synchronously (never on a background
 * pipe), so a failure such as a NaN in a result surfaces in the handler and is mapped to a 500 problem.
 */
public final class JacksonJsonMapper implements JsonMapper {
    private final ObjectMapper mapper;

    public JacksonJsonMapper(ObjectMapper mapper) {
        this.mapper = mapper;
    }

    @Override
    public String toJsonString(Object obj, Type type) {
        try {
            return mapper.writerFor(mapper.constructType(type)).writeValueAsString(obj);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public InputStream toJsonStream(Object obj, Type type) {
        return new ByteArrayInputStream(toJsonString(obj, type).getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    @Override
    public <T> T fromJsonString(String json, Type targetType) {
        try {
            return mapper.readValue(json, mapper.constructType(targetType));
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public <T> T fromJsonStream(InputStream json, Type targetType) {
        try {
            return mapper.readValue(json, mapper.constructType(targetType));
        } catch (java.io.IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
