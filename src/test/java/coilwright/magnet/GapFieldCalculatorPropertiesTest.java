package coilwright.magnet;

import net.jqwik.api.Assume;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Properties of the gap-field solution over random valid radial and axial designs. */
class GapFieldCalculatorPropertiesTest {

    private static final List<String> GRADES = MagnetGrades.names();

    @Provide
    Arbitrary<RadialSurfaceRotor> radialRotors() {
        return Combinators.combine(Arbitraries.of(RotorSide.values()), Arbitraries.of(GRADES),
                Arbitraries.doubles().between(0.08, 1.0).ofScale(6), Arbitraries.doubles().between(0.01, 0.5).ofScale(6),
                Arbitraries.doubles().between(0.0003, 0.005).ofScale(6), Arbitraries.doubles().between(0.001, 0.02).ofScale(6),
                Arbitraries.doubles().between(0.3, 1.0).ofScale(6), Arbitraries.doubles().between(0.0, 0.004).ofScale(6))
                .as(RadialSurfaceRotor::new);
    }

    @Provide
    Arbitrary<AxialDualRotor> axialRotors() {
        return Combinators.combine(Arbitraries.of(GRADES), Arbitraries.doubles().between(0.01, 0.05).ofScale(6),
                Arbitraries.doubles().between(0.01, 0.06).ofScale(6), Arbitraries.doubles().between(0.12, 0.5).ofScale(6),
                Arbitraries.doubles().between(0.003, 0.03).ofScale(6), Arbitraries.doubles().between(0.005, 0.03).ofScale(6),
                Arbitraries.doubles().between(0.0005, 0.005).ofScale(6))
                .as(AxialDualRotor::new);
    }

    private static void assertSane(GapField f) {
        double[] all = {f.remanenceAtTempT(), f.polePitchM(), f.poleArcRatio(), f.carterCoefficient(),
                f.effectiveGapM(), f.gapFluxDensity1dT(), f.fundamentalAmplitude1dT(), f.fundamentalAmplitude2dT(),
                f.peakFluxDensity2dT(), f.fluxPerPole1dWb(), f.fluxPerPoleWb(), f.leakageRatio(), f.magnetVolumeM3(),
                f.magnetMassKg()};
        for (double v : all) {
            assertTrue(Double.isFinite(v) && v > 0, "finite and positive: " + f);
        }
        f.harmonicAmplitudes().forEach(h -> assertTrue(Double.isFinite(h.cosineCoefficientT()), "harmonic " + h));
        assertTrue(f.carterCoefficient() >= 1.0);
        // leakage: the 2-D fundamental never exceeds the 1-D one
        assertTrue(f.fundamentalAmplitude2dT() <= f.fundamentalAmplitude1dT() * (1 + 1e-12), "2-D <= 1-D: " + f);
        assertTrue(f.fluxPerPoleWb() <= f.fluxPerPole1dWb() * (1 + 1e-12), "2-D flux <= 1-D flux: " + f);
    }

    private static void assertHarmonicsDecay(GapField f) {
        // |B_v| <= (4 / (v pi)) Br, and the field transfer factor B_v / Br_v falls with order
        double previousTransfer = Double.POSITIVE_INFINITY;
        for (HarmonicAmplitude h : f.harmonicAmplitudes()) {
            int v = h.order();
            assertTrue(h.amplitudeT() <= 4 / (v * Math.PI) * f.remanenceAtTempT() * (1 + 1e-12), "bound " + h);
            double brv = HarmonicGapField.remanenceHarmonicT(v, f.remanenceAtTempT(), f.poleArcRatio());
            if (Math.abs(brv) > 1e-6) {
                double transfer = h.cosineCoefficientT() / brv;
                assertTrue(transfer > 0 && transfer <= previousTransfer * (1 + 1e-9), "transfer falls at " + v);
                previousTransfer = transfer;
            }
        }
    }

    @Property(tries = 300)
    void radial_results_are_finite_positive_and_show_leakage(@ForAll("radialRotors") RadialSurfaceRotor r,
                                                            @ForAll @IntRange(min = 1, max = 20) int polePairs,
                                                            @ForAll @IntRange(min = 6, max = 72) int slots,
                                                            @ForAll @DoubleRange(min = -40, max = 200) double tempC) {
        // a slot opening as wide as the slot pitch is refused by design; that case has its own test
        Assume.that(r.slotOpeningM() < 0.9 * Math.PI * r.gapDiameterM() / slots);
        GapField f = GapFieldCalculator.solve(r, 2 * polePairs, slots, tempC);
        assertSane(f);
        assertHarmonicsDecay(f);
    }

    @Property(tries = 300)
    void axial_results_are_finite_positive_and_show_leakage(@ForAll("axialRotors") AxialDualRotor a,
                                                           @ForAll @IntRange(min = 2, max = 12) int polePairs,
                                                           @ForAll @DoubleRange(min = -40, max = 200) double tempC) {
        int poles = 2 * polePairs;
        double pitchAtInnerM = 2 * a.innerRadiusM() * Math.tan(Math.PI / poles);
        if (a.magnetWidthM() >= Math.min(pitchAtInnerM, AxialDualRotor.polePitchAtM(a.magnetCentreRadiusM(), poles))) {
            return; // overlapping layouts are refused; covered by AxialDualRotorTest
        }
        GapField f = GapFieldCalculator.solve(a, poles, 0, tempC);
        assertSane(f);
        assertHarmonicsDecay(f);
    }

    @Property(tries = 200)
    void radial_flux_rises_with_magnet_thickness_and_falls_with_gap(@ForAll("radialRotors") RadialSurfaceRotor r,
                                                                   @ForAll @IntRange(min = 1, max = 20) int polePairs) {
        GapField base = GapFieldCalculator.solve(r, 2 * polePairs, 24, 20);
        GapField thicker = GapFieldCalculator.solve(r.withMagnetThicknessM(r.magnetThicknessM() * 1.2), 2 * polePairs,
                24, 20);
        GapField wider = GapFieldCalculator.solve(r.withAirGapM(r.airGapM() * 1.2), 2 * polePairs, 24, 20);
        assertTrue(thicker.fluxPerPoleWb() > base.fluxPerPoleWb(), "thicker magnets");
        assertTrue(wider.fluxPerPoleWb() < base.fluxPerPoleWb(), "wider gap");
        assertTrue(thicker.fluxPerPole1dWb() > base.fluxPerPole1dWb() && wider.fluxPerPole1dWb() < base.fluxPerPole1dWb());
    }

    @Property(tries = 200)
    void axial_flux_rises_with_magnet_thickness_and_falls_with_clearance(@ForAll("axialRotors") AxialDualRotor a) {
        int poles = 4;
        double pitchAtInnerM = 2 * a.innerRadiusM() * Math.tan(Math.PI / poles);
        if (a.magnetWidthM() >= Math.min(pitchAtInnerM, AxialDualRotor.polePitchAtM(a.magnetCentreRadiusM(), poles))
                || a.magnetThicknessM() * 1.2 > 0.1) {
            return;
        }
        GapField base = GapFieldCalculator.solve(a, poles, 0, 20);
        GapField thicker = GapFieldCalculator.solve(a.withMagnetThicknessM(a.magnetThicknessM() * 1.2), poles, 0, 20);
        GapField looser = GapFieldCalculator.solve(a.withClearancePerSideM(a.clearancePerSideM() * 1.2), poles, 0, 20);
        assertTrue(thicker.fluxPerPoleWb() > base.fluxPerPoleWb(), "thicker magnets");
        assertTrue(looser.fluxPerPoleWb() < base.fluxPerPoleWb(), "more clearance");
    }
}
