package coilwright.losses;

import coilwright.machine.Connection;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Losses are never negative and never NaN. */
class LossPropertiesTest {

    @Property(tries = 200)
    void iron_loss_is_never_negative(@ForAll @Scale(6) @DoubleRange(min = 0, max = 2.2) double b,
                                     @ForAll @Scale(6) @DoubleRange(min = 0, max = 5000) double f,
                                     @ForAll @IntRange(min = 0, max = 11) int grade) {
        ElectricalSteel.SpecificLoss l = ElectricalSteels.all().get(grade).specificLoss(b, f);
        assertTrue(l.hysteresisWPerKg() >= 0 && l.eddyWPerKg() >= 0 && l.excessWPerKg() >= 0
                && Double.isFinite(l.totalWPerKg()));
    }

    @Property(tries = 100)
    void conductor_eddy_loss_is_never_negative(@ForAll @Scale(6) @DoubleRange(min = 0.2e-3, max = 3e-3) double d,
                                               @ForAll @Scale(6) @DoubleRange(min = 0, max = 3000) double rpm,
                                               @ForAll @IntRange(min = 1, max = 8) int strands,
                                               @ForAll @Scale(6) @DoubleRange(min = -20, max = 180) double windingC) {
        double w = ConductorEddyLoss.airCored(ConductorEddyLossTest.ROTOR, 16, 40, 12, 30, strands, d, rpm, windingC)
                .totalW();
        assertTrue(w >= 0 && Double.isFinite(w));
    }

    @Property(tries = 200)
    void windage_and_friction_are_never_negative(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 1.5) double r,
                                                 @ForAll @Scale(6) @DoubleRange(min = 0, max = 2000) double omega,
                                                 @ForAll @Scale(6) @DoubleRange(min = 1e-4, max = 0.05) double clearance,
                                                 @ForAll @Scale(6) @DoubleRange(min = 0, max = 1e5) double load) {
        double t = Windage.freeDiscTorqueNm(r, omega, 1.2, 1.6e-5) + Windage.enclosedDiscTorqueNm(r, clearance, omega,
                1.2, 1.6e-5) + Windage.airGapCylinderTorqueNm(r, 0.1, clearance, omega, 1.2, 1.6e-5)
                + new Bearing(BearingType.TAPERED_ROLLER, 0.04, load, 0).frictionTorqueNm();
        assertTrue(t >= 0 && Double.isFinite(t));
    }

    @Property(tries = 200)
    void delta_circulation_is_never_negative(@ForAll @Scale(6) @DoubleRange(min = 0, max = 500) double e1,
                                             @ForAll @Scale(6) @DoubleRange(min = 0, max = 0.5) double ratio,
                                             @ForAll @Scale(6) @DoubleRange(min = 0.001, max = 10) double r,
                                             @ForAll @Scale(6) @DoubleRange(min = 0, max = 0.1) double l,
                                             @ForAll @Scale(6) @DoubleRange(min = 0, max = 3000) double rpm) {
        DeltaCirculation d = DeltaCirculation.at(Connection.DELTA, e1, ratio, r, l, ZeroSequenceInductance.toothCoils(),
                16, rpm);
        assertTrue(d.copperLossW() >= 0 && d.dragTorqueNm() >= 0 && d.currentRmsA() >= 0
                && Double.isFinite(d.copperLossHighW()));
    }
}
