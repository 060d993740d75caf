package coilwright.winding;

import coilwright.validation.Checks;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.apache.commons.math3.fraction.Fraction;

import java.util.List;
import java.util.Objects;

/**
 * A balanced winding laid out by the star of slots ({@link StarOfSlots}): coils, their phases and
 * polarities, parallel-path groups and the winding factors of the odd harmonics 1..13.
 *
 * @param spec                 the request it was laid out for
 * @param q                    slots per pole per phase Q/(2pm), reduced fraction
 * @param periodicity          t = gcd(Q, p): the number of identical sections of the machine
 * @param lcmSlotsPoles        LCM(Q, 2p): cogging torque periods per mechanical revolution
 * @param gcdSlotsPoles        gcd(Q, 2p)
 * @param slotAngleElecDeg     slot pitch in electrical degrees, 360*p/Q (not reduced modulo 360)
 * @param coilPitchSlots       coil pitch y actually used, in slots
 * @param coils                every coil, numbered 1.. in the order of their go slots
 * @param phaseCoils           per phase (index 0..m-1), the coil numbers in series order along the slots
 * @param coilsPerPhase        coils in each phase (all phases equal)
 * @param coilsPerPathPerPhase coils in series in one parallel path: coilsPerPhase / parallelPaths
 * @param parallelPathCoils    per phase, per parallel path, the coil numbers of that path
 * @param windingFactors       kw, skew and total factors for orders 1, 3, 5, ..., 13
 */
public record Winding(WindingSpec spec, Fraction q, int periodicity, int lcmSlotsPoles, int gcdSlotsPoles,
                      double slotAngleElecDeg, int coilPitchSlots, List<Coil> coils, List<List<Integer>> phaseCoils,
                      int coilsPerPhase, int coilsPerPathPerPhase, List<List<List<Integer>>> parallelPathCoils,
                      List<HarmonicFactor> windingFactors) {
    /** Harmonic orders reported: the odd ones from 1 to 13. */
    public static final List<Integer> HARMONIC_ORDERS = List.of(1, 3, 5, 7, 9, 11, 13);

    public Winding {
        Objects.requireNonNull(spec, "spec");
        Objects.requireNonNull(q, "q");
        coils = List.copyOf(coils);
        phaseCoils = phaseCoils.stream().map(List::copyOf).toList();
        parallelPathCoils = parallelPathCoils.stream().map(ph -> ph.stream().map(List::copyOf).toList()).toList();
        windingFactors = List.copyOf(windingFactors);
        if (phaseCoils.size() != spec.phases() || coils.size() != coilsPerPhase * spec.phases()
                || coilsPerPathPerPhase * spec.parallelPaths() != coilsPerPhase
                || windingFactors.size() != HARMONIC_ORDERS.size()) {
            throw new IllegalArgumentException("inconsistent winding for " + spec);
        }
    }

    /** Phase letter for index 0..5: A, B, C, D, E, F. */
    public static String phaseName(int phase) {
        if (phase < 0 || phase > 5) {
            throw new IllegalArgumentException("phase index " + phase + " outside 0..5");
        }
        return String.valueOf((char) ('A' + phase));
    }

    public int qNumerator() {
        return q.getNumerator();
    }

    public int qDenominator() {
        return q.getDenominator();
    }

    /** Series coils per phase (one parallel path); series turns per phase = this * turns per coil. */
    public int seriesCoilsPerPhase() {
        return coilsPerPathPerPhase;
    }

    /** True when q &lt; 1, i.e. coils wound round single teeth (fractional-slot concentrated winding). */
    public boolean toothCoils() {
        return coilPitchSlots == 1 && q.doubleValue() < 1;
    }

    /**
     * The factors of harmonic {@code order}.
     *
     * @throws InvalidInputException when order is not one of {@link #HARMONIC_ORDERS}
     */
    public HarmonicFactor harmonic(int order) {
        int i = HARMONIC_ORDERS.indexOf(order);
        if (i < 0) {
            throw new InvalidInputException(new FieldError("order", Integer.toString(order),
                    "order = " + order + ": must be an odd harmonic 1 to 13", "1, 3, 5, 7, 9, 11, 13"));
        }
        return windingFactors.get(i);
    }

    /** Fundamental winding factor kw1 (distribution times pitch), without skew. */
    public double fundamentalWindingFactor() {
        return windingFactors.get(0).windingFactor();
    }

    /** Fundamental factor with skew: kw1 * ks1. This is the factor in E = sqrt(2)*pi*f*N*k*Phi1. */
    public double fundamentalTotalFactor() {
        return windingFactors.get(0).totalFactor();
    }

    /** The third harmonic's factors (matter for circulating current in a delta connection). */
    public HarmonicFactor thirdHarmonicFactor() {
        return harmonic(3);
    }

    /**
     * Ratio of the v-th harmonic phase EMF to the fundamental, E_v/E_1, for a given air-gap flux-density
     * harmonic ratio B_v/B_1.
     * <p>
     * E_v is proportional to (v*f) * kw_v * ks_v * Phi_v, and the flux per pole of the v-th harmonic,
     * which has v times as many poles, is Phi_v = (2/pi) * B_v * (pole area / v). The factor v cancels,
     * so E_v/E_1 = (kw_v * ks_v * B_v) / (kw_1 * ks_1 * B_1): the usual EMF-harmonic relation of machine-design
     * texts (derivation as given here).
     *
     * @param order                 odd harmonic order 1..13
     * @param fluxDensityHarmonicRatio B_v/B_1 of the rotor field at the coils, finite, &gt;= 0
     * @return E_v/E_1, &gt;= 0 (phase EMF; line-to-line triplens of a star connection cancel separately)
     * @throws InvalidInputException for an order outside 1..13 odd or a negative/non-finite ratio
     */
    public double emfHarmonicRatio(int order, double fluxDensityHarmonicRatio) {
        new Checks().nonNegative("fluxDensityHarmonicRatio", fluxDensityHarmonicRatio).throwIfAny();
        HarmonicFactor h = harmonic(order);
        return h.totalFactor() * fluxDensityHarmonicRatio / fundamentalTotalFactor();
    }

    /** The coil with 1-based number {@code number}. */
    public Coil coil(int number) {
        if (number < 1 || number > coils.size()) {
            throw new IllegalArgumentException("coil number " + number + " outside 1.." + coils.size());
        }
        return coils.get(number - 1);
    }
}
