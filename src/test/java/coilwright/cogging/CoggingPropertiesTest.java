package coilwright.cogging;

import coilwright.magnet.RotorSide;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.math3.util.ArithmeticUtils;

import static org.junit.jupiter.api.Assertions.*;

/** Cogging repeats LCM(Q, 2p) times per revolution, is zero without teeth and is never NaN. */
class CoggingPropertiesTest {

    @Property(tries = 15)
    void field_torque_repeats_every_cogging_period(@ForAll @IntRange(min = 3, max = 36) int slots,
                                                  @ForAll @IntRange(min = 1, max = 12) int polePairs,
                                                  @ForAll @Scale(4) @DoubleRange(min = 0.5, max = 1.0) double arc,
                                                  @ForAll @Scale(4) @DoubleRange(min = 0.1, max = 0.9) double where) {
        double diameter = 0.12;
        double opening = Math.min(0.003, 0.4 * Math.PI * diameter / slots);
        Assume.that(ArithmeticUtils.lcm(slots, 2 * polePairs) <= 120);
        CoggingInput in = new CoggingInput(slots, 2 * polePairs, RotorSide.INNER, diameter, 0.05, 0.001, 0.004, arc,
                opening, 1.2, 1.05, 0);
        SubdomainField f = CoggingCalculator.field(in);
        double period = 2 * Math.PI / ArithmeticUtils.lcm(slots, 2 * polePairs);
        double a = CoggingCalculator.unskewedTorqueNm(in, f, where * period);
        double b = CoggingCalculator.unskewedTorqueNm(in, f, (where + 1) * period);
        double scale = Math.abs(CoggingCalculator.unskewedTorqueNm(in, f, 0.25 * period))
                + Math.abs(CoggingCalculator.unskewedTorqueNm(in, f, 0.125 * period)) + 1e-9;
        assertEquals(a, b, 1e-6 * scale);
        CoggingTorque c = CoggingCalculator.radial(in);
        assertTrue(c.peakToPeakNm() >= 0 && Double.isFinite(c.peakToPeakNm()));
        assertEquals(ArithmeticUtils.lcm(slots, 2 * polePairs), c.cyclesPerRevolution());
    }

    @Property(tries = 10)
    void air_cored_stators_never_cog(@ForAll @Scale(4) @DoubleRange(min = 0, max = 6.3) double angle) {
        assertEquals(0, CoggingCalculator.airCored().torqueNm(angle));
    }
}
