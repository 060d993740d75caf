package coilwright.cogging;

import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CoggingReferenceTest {

    @Test
    @DisplayName("Subdomain field and a finite-element solution of the same idealised geometry agree within 12 % on cogging force")
    void agrees_with_a_finite_element_solution() {
        // source: test-only finite-element reference (SlottedMagnetFieldFe), 0.25 mm cells; its own result rises
        // with refinement (38.1 N/m at 0.5 mm, 49.6 at 0.25 mm, 50.8 at 0.125 mm), the subdomain model gives 53.5.
        // Geometry: 3 slots of 12 mm with 3 mm openings, 2 poles of 18 mm, magnets 13.5 mm wide and 3 mm thick,
        // 1 mm gap, Br 1.2 T, mu_rec 1.05. Cogging period 6 mm (24 cells); the force is odd about shift 0.
        double h = 0.25e-3;
        SlottedMagnetFieldFe fe = new SlottedMagnetFieldFe(h, 3, 48, 12, 24, 2, 54, 12, 4, 1.2, 1.05);
        int half = 12;
        double[] j = new double[half + 2];
        for (int s = 0; s <= half + 1; s++) {
            j[s] = fe.energy(s, 1e-11);
        }
        double feMax = 0;
        for (int s = 1; s <= half; s++) {
            feMax = Math.max(feMax, Math.abs(j[s + 1] - j[s - 1]) / (2 * h));
        }
        double fePeakToPeak = 2 * feMax;
        SubdomainField sd = new SubdomainField(3, 2, 0.036, 0.003, 0.001, 0.003, 0.75, 1.2, 1.05);
        double sdMax = Double.NEGATIVE_INFINITY;
        double sdMin = Double.POSITIVE_INFINITY;
        for (int i = 0; i < 48; i++) {
            double f = sd.forcePerDepth(0.006 * i / 48);
            sdMax = Math.max(sdMax, f);
            sdMin = Math.min(sdMin, f);
        }
        assertEquals(fePeakToPeak, sdMax - sdMin, 0.12 * fePeakToPeak);
        assertEquals(0, sd.forcePerDepth(0), 1e-6 * fePeakToPeak, "no force with a pole centre over a slot centre");
    }

    @Test
    @DisplayName("Li & Slemon (1988): cogging of an integral-slot machine is least with a magnet arc of about n + 0.14 slot pitches")
    void optimum_magnet_arc() {
        // source: Li & Slemon, IEEE Trans. Magn. 24(6), 1988 (from memory: optimum arc (n + 0.14) slot pitches);
        // 36 slots, 12 poles: 3 slot pitches per pole; search n = 2; tolerance 0.05 slot pitch
        CoggingInput in = CoggingInput.of(new RadialSurfaceRotor(RotorSide.INNER, "N42", 0.1, 0.08, 0.001, 0.005,
                0.75, 0.0025), WindingSpec.of(36, 12, 3, Layers.SINGLE), 20);
        double bestArc = 0;
        double best = Double.POSITIVE_INFINITY;
        for (double slotPitches = 1.95; slotPitches <= 2.35; slotPitches += 0.01) {
            double pp = CoggingCalculator.radial(in.withPoleArcRatio(slotPitches / 3)).peakToPeakNm();
            if (pp < best) {
                best = pp;
                bestArc = slotPitches;
            }
        }
        assertEquals(2.14, bestArc, 0.05);
        assertTrue(best < 0.3 * CoggingCalculator.radial(in).peakToPeakNm());
    }

    @Test
    @DisplayName("Zhu & Howe (2000): with the same rotor and stator surface, more poles sharing slot edges (a higher goodness factor 2pQ/LCM) give more cogging")
    void goodness_factor_trend() {
        // source: Zhu & Howe, IEEE Trans. Energy Convers. 15(4), 2000: C_T = 2p Q / LCM(Q, 2p) indicates cogging
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.14, 0.08, 0.001, 0.004, 0.8, 0.0025);
        double ct4 = CoggingCalculator.radial(CoggingInput.of(r, WindingSpec.of(12, 8, 3, Layers.DOUBLE), 20))
                .peakToPeakNm(); // C_T = 96 / 24 = 4
        double ct2 = CoggingCalculator.radial(CoggingInput.of(r, WindingSpec.of(12, 10, 3, Layers.DOUBLE), 20))
                .peakToPeakNm(); // C_T = 120 / 60 = 2
        assertTrue(ct4 > 1.5 * ct2, ct4 + " vs " + ct2);
    }

    @Test
    @DisplayName("Skewing by one slot pitch removes cogging (every harmonic is a multiple of Q cycles per revolution)")
    void one_slot_pitch_of_skew_removes_cogging() {
        // source: classical result, e.g. Zhu & Howe 2000 (skew factor sin(k theta/2)/(k theta/2) vanishes for k = nQ)
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.14, 0.08, 0.001, 0.004, 0.8, 0.0025);
        CoggingInput in = CoggingInput.of(r, WindingSpec.of(24, 20, 3, Layers.DOUBLE).withSkewSlotPitches(1.0), 20);
        CoggingTorque unskewed = CoggingCalculator.radial(in.withSkewSlotPitches(0));
        assertEquals(0, CoggingCalculator.radial(in).peakToPeakNm(), 1e-12 * unskewed.peakToPeakNm());
    }
}
