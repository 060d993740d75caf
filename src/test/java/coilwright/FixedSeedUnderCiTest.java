package coilwright;

import java.util.Map;
import java.util.Optional;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.lifecycle.AddLifecycleHook;
import net.jqwik.api.lifecycle.AroundPropertyHook;
import net.jqwik.api.lifecycle.PropertyExecutionResult;
import net.jqwik.api.lifecycle.PropertyExecutor;
import net.jqwik.api.lifecycle.PropertyLifecycleContext;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

class FixedSeedUnderCiTest {

    @Test
    void ci_gets_the_fixed_seed_and_a_named_seed_wins() {
        assertEquals(Optional.of(FixedSeedUnderCi.CI_SEED), FixedSeedUnderCi.chosenSeed(Map.of("CI", "true")));
        assertEquals(Optional.of("42"), FixedSeedUnderCi.chosenSeed(Map.of("CI", "true", "COILWRIGHT_TEST_SEED", "42")));
        assertEquals(Optional.empty(), FixedSeedUnderCi.chosenSeed(Map.of()));
        assertEquals(Optional.empty(), FixedSeedUnderCi.chosenSeed(Map.of("CI", "false")));
    }

    @Property(tries = 1)
    @AddLifecycleHook(SeedRecorder.class)
    void under_ci_a_property_runs_with_the_fixed_seed(@ForAll int any) {
        FixedSeedUnderCi.chosenSeed(System.getenv())
                .ifPresent(seed -> assertEquals(Optional.of(seed), SeedRecorder.seen));
    }

    /** Records the seed attribute an inner hook sees. */
    public static final class SeedRecorder implements AroundPropertyHook {
        static volatile Optional<String> seen = Optional.empty();

        @Override
        public PropertyExecutionResult aroundProperty(PropertyLifecycleContext context, PropertyExecutor property) {
            seen = context.attributes().seed();
            return property.execute();
        }
    }
}
