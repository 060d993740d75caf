package coilwright.sizing;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.concurrent.ForkJoinPool;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Requests resembling the three demo scenarios of {@code examples/} find designs that meet every limit, on a small
 * evaluation budget (the ranking is then the best found, not proven).
 */
class SizingDemoScenariosTest {
    private static final ForkJoinPool POOL = new ForkJoinPool(2);

    @AfterAll
    static void close() {
        POOL.shutdown();
    }

    private static SizingResult sized(SizingRequest demo) {
        SizingRequest req = new SizingRequest(demo.drive(), demo.load(), demo.build(), demo.winding(), demo.limits(),
                demo.objective(), demo.prices(), 2, 30);
        SizingResult r = new SizingSearch(POOL).run(req);
        assertTrue(r.feasible(), () -> "near misses: " + r.nearMisses());
        for (SizedDesign d : r.designs()) {
            assertEquals(List.of(), LimitAudit.breaches(req, r, d), d::layout);
        }
        for (SizedDesign d : r.paretoFront()) {
            assertEquals(List.of(), LimitAudit.breaches(req, r, d), d::layout);
        }
        return r;
    }

    @Test
    void axial_wind_24v() {
        SizingResult r = sized(SizingFixtures.axialWind24V());
        assertTrue(r.designs().get(0).figures().cutInWindSpeedMs().orElseThrow() <= 3.5);
        assertTrue(r.counts().candidatesInSpace() > 500_000, "a large space");
    }

    @Test
    void radial_hydro_48v() {
        SizingResult r = sized(SizingFixtures.radialHydro48V());
        assertTrue(r.designs().get(0).figures().ratedEfficiency() >= 0.8);
        assertEquals(24, r.designs().get(0).alternator().winding().slots(), "in the lamination the builder has");
    }

    @Test
    void rewound_motor_12v() {
        SizingResult r = sized(SizingFixtures.rewoundMotor12V());
        assertEquals(36, r.designs().get(0).alternator().winding().slots(), "in the motor's own stator");
        assertTrue(r.designs().get(0).figures().openCircuitLineRmsV() <= 50, "within extra-low voltage");
    }
}
