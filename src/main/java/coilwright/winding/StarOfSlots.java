package coilwright.winding;

import coilwright.validation.Checks;
import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.fraction.Fraction;
import org.apache.commons.math3.util.ArithmeticUtils;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * Lays out a balanced m-phase winding with the star of slots (Cros and Viarouge, IEEE Trans. Energy Convers.
 * 17(4), 2002; Bianchi and Dai Pre, IEE Proc. Electr. Power Appl. 153(3), 2006) and computes its winding
 * factors. Air-cored coil stators use the same method with coil positions as slots.
 */
public final class StarOfSlots {
    /** Fundamental winding factors below this are refused: the slot/pole/pitch choice wastes most copper. */
    public static final double MIN_FUNDAMENTAL_FACTOR = 0.3;
    /** Relative tolerance of the numerical balance check. */
    static final double BALANCE_TOLERANCE = 1e-9;

    private StarOfSlots() {
    }

    /**
     * Lays out the winding: coil side phasors at k*alpha (alpha = 2*pi*p/Q electrical), coils assigned to the
     * phases by 2m sectors of 180/m degrees (each phase a positive and an opposite negative sector), coils in a
     * negative sector connected reversed. Double layer: a coil starts in every slot (Q coils). Single layer:
     * Q/2 coils; with an odd pitch a coil starts in every other slot (alternate teeth for tooth coils), with an
     * even pitch (only a 180-degree span is possible) the slots are sorted into phase belts and paired.
     * Winding factor of harmonic v: kw_v = |sum over the phase's coils of polarity * (e^(j v theta_go) -
     * e^(j v theta_return))| / (2 * coils per phase), which holds distribution and pitch together; skew factor
     * ks_v = sin(v s/2)/(v s/2), s = skewSlotPitches * alpha.
     *
     * @param spec the requested winding (already range-checked)
     * @return the balanced layout and its factors
     * @throws InfeasibleDesignException when the combination cannot be balanced (checked by the closed-form
     *         condition and again numerically), when kw1 &lt; {@value #MIN_FUNDAMENTAL_FACTOR}, or when the skew
     *         cancels most of the fundamental
     * @throws InvalidInputException (field {@code parallelPaths}) when the phase's coils cannot be split into
     *         that many identical parallel paths
     */
    public static Winding layout(WindingSpec spec) {
        int slots = spec.slots();
        int p = spec.polePairs();
        int m = spec.phases();
        int pitch = Feasibility.resolvePitch(spec);
        Feasibility.requireBalanceable(spec, pitch);
        SlotStar star = new SlotStar(slots, p);
        List<Coil> coils = CoilAssignment.assign(spec, pitch, star);

        List<List<Integer>> phaseCoils = new ArrayList<>();
        for (int ph = 0; ph < m; ph++) {
            int phase = ph;
            phaseCoils.add(coils.stream().filter(c -> c.phase() == phase).map(Coil::number).toList());
        }
        List<HarmonicFactor> factors = factors(spec, coils, phaseCoils.get(0), star);
        double kw1 = factors.get(0).windingFactor();
        if (kw1 < MIN_FUNDAMENTAL_FACTOR) {
            double kp = Math.abs(Math.sin(Math.PI * pitch * p / slots));
            throw new InfeasibleDesignException("slots", String.format(Locale.ROOT,
                    "%s and a coil pitch of %d slot(s): the fundamental winding factor is %.3f (pitch factor %.3f,"
                            + " distribution factor %.3f), below the useful minimum %.1f; choose another pitch or"
                            + " a slot/pole combination with q nearer 1/2 to 3", Feasibility.describe(spec), pitch,
                    kw1, kp, kp > 0 ? kw1 / kp : 0.0, MIN_FUNDAMENTAL_FACTOR));
        }
        requireBalanced(spec, coils, phaseCoils, star);
        double ks1 = factors.get(0).skewFactor();
        if (ks1 < MIN_FUNDAMENTAL_FACTOR) {
            throw new InfeasibleDesignException("skewSlotPitches", String.format(Locale.ROOT,
                    "skewSlotPitches = %s: a skew of %.1f electrical degrees leaves a fundamental skew factor of"
                            + " only %.3f; use less skew (one cogging period, 360/LCM(Q, 2p) mechanical degrees,"
                            + " is usually enough)", Checks.fmt(spec.skewSlotPitches()),
                    spec.skewSlotPitches() * 360.0 * p / slots, ks1));
        }

        List<Integer> allowed = ParallelPaths.allowed(coils, phaseCoils, star);
        int a = spec.parallelPaths();
        if (!allowed.contains(a)) {
            String allowedText = allowed.stream().map(String::valueOf).collect(Collectors.joining(", "));
            throw new InvalidInputException(new FieldError("parallelPaths", Integer.toString(a),
                    "parallelPaths = " + a + ": the " + phaseCoils.get(0).size() + " coils of each phase cannot be"
                            + " split into " + a + " identical groups; allowed: " + allowedText, allowedText));
        }
        int coilsPerPhase = phaseCoils.get(0).size();
        List<List<List<Integer>>> paths = phaseCoils.stream()
                .map(list -> ParallelPaths.split(coils, list, a, star)).toList();
        return new Winding(spec, new Fraction(slots, spec.poles() * m), ArithmeticUtils.gcd(slots, p),
                ArithmeticUtils.lcm(slots, spec.poles()), ArithmeticUtils.gcd(slots, spec.poles()),
                360.0 * p / slots, pitch, coils, phaseCoils, coilsPerPhase, coilsPerPhase / a, paths, factors);
    }

    /**
     * The parallel-path counts the layout allows: divisors a of the coils per phase such that each path gets
     * the same mix of coil phasors (so the paths have equal EMF and no circulating current).
     *
     * @throws InfeasibleDesignException as {@link #layout(WindingSpec)}
     */
    public static List<Integer> allowedParallelPaths(WindingSpec spec) {
        Winding w = layout(spec.withParallelPaths(1));
        return ParallelPaths.allowed(w.coils(), w.phaseCoils(), new SlotStar(spec.slots(), spec.polePairs()));
    }

    /**
     * The balanced layouts (automatic pitch, one path, no skew) for every even pole count in
     * [minPoles, maxPoles] that can be wound on {@code slots} slots; infeasible pole counts are skipped.
     *
     * @throws InvalidInputException for slots outside 2..400, phases not 1 or 3, poles outside 2..400 or
     *         minPoles &gt; maxPoles
     */
    public static List<Winding> feasiblePoleCounts(int slots, int phases, Layers layers, int minPoles, int maxPoles) {
        Checks c = new Checks();
        c.intRange("minPoles", minPoles, 2, WindingSpec.MAX_POLES);
        c.intRange("maxPoles", maxPoles, 2, WindingSpec.MAX_POLES);
        c.require(minPoles <= maxPoles, "maxPoles", maxPoles, "must be >= minPoles (" + minPoles + ")",
                ">= minPoles");
        c.throwIfAny();
        WindingSpec.of(slots, 2, phases, layers);
        List<Winding> result = new ArrayList<>();
        for (int poles = minPoles + (minPoles % 2); poles <= maxPoles; poles += 2) {
            try {
                result.add(layout(WindingSpec.of(slots, poles, phases, layers)));
            } catch (InfeasibleDesignException e) {
                // not a balanced combination: skipped, as documented
            }
        }
        return List.copyOf(result);
    }

    private static void requireBalanced(WindingSpec spec, List<Coil> coils, List<List<Integer>> phaseCoils,
                                        SlotStar star) {
        int m = spec.phases();
        Complex[] sums = new Complex[m];
        boolean ok = true;
        for (int ph = 0; ph < m; ph++) {
            sums[ph] = phaseSum(coils, phaseCoils.get(ph), star, 1);
            ok &= phaseCoils.get(ph).size() == phaseCoils.get(0).size();
        }
        double scale = sums[0].abs();
        ok &= scale > BALANCE_TOLERANCE;
        for (int ph = 1; ph < m && ok; ph++) {
            Complex expected = sums[0].multiply(Complex.I.multiply(ph * SlotStar.phaseSpacingRad(m)).exp());
            ok = sums[ph].subtract(expected).abs() <= BALANCE_TOLERANCE * scale;
        }
        if (!ok) {
            StringBuilder phasors = new StringBuilder();
            for (int ph = 0; ph < m; ph++) {
                phasors.append(String.format(Locale.ROOT, "%s%s: %d coils, %.3f at %.1f deg", ph > 0 ? "; " : "",
                        Winding.phaseName(ph), phaseCoils.get(ph).size(), sums[ph].abs(),
                        Math.toDegrees(sums[ph].getArgument())));
            }
            throw new InfeasibleDesignException("slots", Feasibility.describe(spec) + ": the phase EMFs are not"
                    + " balanced (" + phasors + "), so the combination cannot be wound as a balanced winding");
        }
    }

    private static List<HarmonicFactor> factors(WindingSpec spec, List<Coil> coils, List<Integer> phaseA,
                                                SlotStar star) {
        double skewRad = spec.skewSlotPitches() * 2 * Math.PI * spec.polePairs() / spec.slots();
        List<HarmonicFactor> out = new ArrayList<>();
        for (int v : Winding.HARMONIC_ORDERS) {
            double kw = Math.min(1.0, phaseSum(coils, phaseA, star, v).abs() / (2.0 * phaseA.size()));
            double x = v * skewRad / 2;
            double ks = x == 0 ? 1.0 : Math.min(1.0, Math.abs(Math.sin(x) / x));
            out.add(new HarmonicFactor(v, kw, ks, kw * ks));
        }
        return out;
    }

    static Complex phaseSum(List<Coil> coils, List<Integer> numbers, SlotStar star, int order) {
        Complex sum = Complex.ZERO;
        for (int n : numbers) {
            Coil c = coils.get(n - 1);
            sum = sum.add(star.coilPhasor(c.goSlot() - 1, c.returnSlot() - 1, c.polarity(), order));
        }
        return sum;
    }
}
