package coilwright.web;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import coilwright.service.OldFieldNames;
import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Binds a JSON body to a record and reports every problem at once as one {@link InvalidInputException}
 * with dotted paths ({@code rotor.airGapM}, {@code coils[2].turns}): missing required fields, wrong JSON
 * types, unknown fields, enum names not allowed, non-finite numbers, and the errors thrown by each nested
 * record's compact constructor, re-based under that record's path. Each nested record is built on its own
 * from its subtree, so errors of sibling records are all collected; a record is only constructed when
 * its whole subtree is valid. Leaf values are type-checked here and converted by {@link JsonLeaves}.
 */
public final class RecordBinder {
    static final Object FAILED = new Object();
    private final JsonLeaves leaves;
    private final JsonSyntax syntax;

    public RecordBinder(ObjectMapper mapper) {
        this.syntax = new JsonSyntax(mapper);
        this.leaves = new JsonLeaves(mapper, this);
    }

    /**
     * @throws MalformedJsonException when the text is not one well-formed JSON value
     * @throws InvalidInputException listing every invalid field
     * @throws InfeasibleDesignException when a compact constructor finds the input physically impossible
     */
    public <T> T bind(String json, Class<T> type) {
        return bind(parse(json), type);
    }

    /** As {@link #bind(String, Class)} for an already parsed tree (used by {@link FormBinder}). */
    public <T> T bind(JsonNode tree, Class<T> type) {
        List<FieldError> errors = new ArrayList<>();
        Object value = leaves.bind(tree, type, "", errors);
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
        return type.cast(value);
    }

    /** Parses a request body strictly; an empty body is malformed too ({@link JsonSyntax} words the fault). */
    public JsonNode parse(String json) {
        return syntax.parse(json);
    }

    Object bindRecord(JsonNode node, Class<?> type, String path, List<FieldError> errors) {
        if (OldFieldNames.renamed(type) && node instanceof ObjectNode object) {
            // designs saved under replaced names must bind for ever: rewrite a copy to the current names first
            ObjectNode current = object.deepCopy();
            OldFieldNames.upgrade(type, current);
            node = current;
        }
        RecordComponent[] components = type.getRecordComponents();
        Set<String> names = new LinkedHashSet<>();
        Arrays.stream(components).forEach(c -> names.add(c.getName()));
        int before = errors.size();
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String name = it.next();
            if (!names.contains(name)) {
                String p = join(path, name);
                errors.add(new FieldError(p, JsonLeaves.text(node.get(name)), p + ": unknown field",
                        "known fields: " + String.join(", ", names)));
            }
        }
        Object[] args = new Object[components.length];
        Set<String> failed = new LinkedHashSet<>();
        for (int i = 0; i < components.length; i++) {
            RecordComponent c = components[i];
            args[i] = leaves.bindComponent(node.get(c.getName()), c.getGenericType(), join(path, c.getName()), errors);
            if (args[i] == FAILED) {
                failed.add(c.getName());
            }
        }
        if (errors.size() == before) {
            return construct(type, components, args, path, errors);
        }
        ownChecksDespiteInvalidChildren(type, components, args, failed, path, errors);
        return FAILED;
    }

    /**
     * When only nested (non-scalar) components failed, runs the constructor once with null in their place
     * to report this record's own leaf checks too; errors about the failed components, or any other
     * exception (a constructor that reads a null child), are ignored.
     */
    private void ownChecksDespiteInvalidChildren(Class<?> type, RecordComponent[] components, Object[] args,
                                                 Set<String> failed, String path, List<FieldError> errors) {
        for (int i = 0; i < components.length; i++) {
            if (args[i] == FAILED) {
                if (components[i].getType().isPrimitive() || JsonLeaves.isScalar(components[i].getType())) {
                    return;
                }
                args[i] = null;
            }
        }
        List<FieldError> own = new ArrayList<>();
        try {
            construct(type, components, args, "", own);
        } catch (RuntimeException e) {
            return;
        }
        own.stream()
                .filter(e -> failed.stream().noneMatch(f -> e.field().equals(f) || e.field().startsWith(f + ".")
                        || e.field().startsWith(f + "[")))
                .map(e -> e.under(path))
                .forEach(errors::add);
    }

    private Object construct(Class<?> type, RecordComponent[] components, Object[] args, String path,
                             List<FieldError> errors) {
        try {
            return CANONICAL.get(type).newInstance(args);
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            if (cause instanceof InvalidInputException invalid) {
                errors.addAll(invalid.under(path).errors());
                return FAILED;
            }
            if (cause instanceof InfeasibleDesignException infeasible) {
                String field = infeasible.field().isEmpty() ? path : join(path, infeasible.field());
                throw new InfeasibleDesignException(field, infeasible.getMessage());
            }
            if (cause instanceof IllegalArgumentException bad) {
                String p = path.isEmpty() ? "body" : path;
                errors.add(new FieldError(p, "", p + ": " + bad.getMessage(), ""));
                return FAILED;
            }
            throw cause instanceof RuntimeException re ? re : new IllegalStateException(cause);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot construct " + type.getName(), e);
        }
    }

    private static final ClassValue<Constructor<?>> CANONICAL = new ClassValue<>() {
        @Override
        protected Constructor<?> computeValue(Class<?> type) {
            try {
                Constructor<?> c = type.getDeclaredConstructor(Arrays.stream(type.getRecordComponents())
                        .map(RecordComponent::getType).toArray(Class<?>[]::new));
                c.setAccessible(true);
                return c;
            } catch (NoSuchMethodException e) {
                throw new IllegalStateException("no canonical constructor in " + type.getName(), e);
            }
        }
    };

    static String join(String path, String name) {
        return path.isEmpty() ? name : path + "." + name;
    }
}
