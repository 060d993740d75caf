package coilwright.conductor;

import coilwright.validation.Checks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;

/**
 * Lists of stock magnet-wire sizes for pickers and for the rewind planner: every AWG from
 * {@value WireSize#MIN_AWG} to {@value WireSize#MAX_AWG}, and the metric nominal diameters of the R20
 * preferred-number series (ISO 3) used by IEC 60317-0-1, 0.100 mm to 2.800 mm.
 */
public final class WireCatalogue {
    /** Enamel grade used by the no-argument lists: grade 2, the usual choice for machine windings (common practice). */
    public static final int DEFAULT_GRADE = 2;
    /** Relative copper-area tolerance of {@link #strandAlternatives}: +-5 %. */
    public static final double STRAND_AREA_TOLERANCE = 0.05;

    /** source: R20 preferred numbers (ISO 3) as used for IEC 60317-0-1 nominal diameters, mm (from memory). */
    private static final double[] METRIC_MM = {
            0.100, 0.112, 0.125, 0.140, 0.160, 0.180, 0.200, 0.224, 0.250, 0.280, 0.315, 0.355, 0.400, 0.450,
            0.500, 0.560, 0.630, 0.710, 0.800, 0.900, 1.000, 1.120, 1.250, 1.400, 1.600, 1.800, 2.000, 2.240,
            2.500, 2.800};

    private WireCatalogue() {
    }

    /** Nearest stock sizes around a wanted copper area; either side is empty past the end of the list. */
    public record SizeBracket(Optional<WireSpec> below, Optional<WireSpec> above) {
    }

    /**
     * n strands in hand of one stock size whose copper area is close to a target.
     *
     * @param wire               the size with {@code strandsInHand} set to n
     * @param copperAreaM2       copper area of all n strands, m^2
     * @param relativeDeviation  (area - target) / target
     */
    public record StrandOption(WireSpec wire, double copperAreaM2, double relativeDeviation) {
    }

    /** Every AWG size, single strand, grade {@value #DEFAULT_GRADE}, largest wire first. */
    public static List<WireSpec> awgSizes() {
        return awgSizes(DEFAULT_GRADE);
    }

    /** Every AWG size, single strand, with the given enamel grade (1 or 2), largest wire first. */
    public static List<WireSpec> awgSizes(int insulationGrade) {
        return IntStream.rangeClosed(WireSize.MIN_AWG, WireSize.MAX_AWG)
                .mapToObj(n -> WireSpec.awg(n, insulationGrade)).toList();
    }

    /** Metric preferred sizes, single strand, grade {@value #DEFAULT_GRADE}, smallest first. */
    public static List<WireSpec> metricSizes() {
        return metricSizes(DEFAULT_GRADE);
    }

    /** Metric preferred sizes, single strand, with the given enamel grade (1 or 2), smallest first. */
    public static List<WireSpec> metricSizes(int insulationGrade) {
        List<WireSpec> out = new ArrayList<>();
        for (double mm : METRIC_MM) {
            out.add(WireSpec.metric(mm / 1000.0, insulationGrade));
        }
        return List.copyOf(out);
    }

    /**
     * The AWG sizes just below and just above a wanted copper area (single strand, grade
     * {@value #DEFAULT_GRADE}). A size whose area equals the target is both.
     *
     * @param copperAreaM2 wanted copper area, m^2, &gt; 0
     */
    public static SizeBracket nearestAwgBelowAndAbove(double copperAreaM2) {
        return bracket(awgSizes(), copperAreaM2);
    }

    /** As {@link #nearestAwgBelowAndAbove} over the metric preferred sizes. */
    public static SizeBracket nearestMetricBelowAndAbove(double copperAreaM2) {
        return bracket(metricSizes(), copperAreaM2);
    }

    private static SizeBracket bracket(List<WireSpec> sizes, double copperAreaM2) {
        new Checks().positive("copperAreaM2", copperAreaM2).throwIfAny();
        Optional<WireSpec> below = sizes.stream().filter(w -> w.copperAreaM2() <= copperAreaM2)
                .max(Comparator.comparingDouble(WireSpec::copperAreaM2));
        Optional<WireSpec> above = sizes.stream().filter(w -> w.copperAreaM2() >= copperAreaM2)
                .min(Comparator.comparingDouble(WireSpec::copperAreaM2));
        return new SizeBracket(below, above);
    }

    /**
     * Ways to make up a copper area from n equal strands in hand (n = 1..maxStrands) of one stock size,
     * AWG or metric preferred, within +-5 % of the target. Sorted by fewest strands, then smallest deviation.
     *
     * @param targetAreaM2 wanted conductor copper area, m^2, &gt; 0
     * @param maxStrands   most strands in hand, 1 to {@value WireSpec#MAX_STRANDS}
     */
    public static List<StrandOption> strandAlternatives(double targetAreaM2, int maxStrands) {
        new Checks().positive("targetAreaM2", targetAreaM2)
                .intRange("maxStrands", maxStrands, 1, WireSpec.MAX_STRANDS).throwIfAny();
        List<WireSpec> sizes = new ArrayList<>(awgSizes());
        sizes.addAll(metricSizes());
        List<StrandOption> out = new ArrayList<>();
        for (WireSpec size : sizes) {
            for (int n = 1; n <= maxStrands; n++) {
                double area = n * size.copperAreaM2();
                double dev = (area - targetAreaM2) / targetAreaM2;
                if (Math.abs(dev) <= STRAND_AREA_TOLERANCE) {
                    out.add(new StrandOption(size.withStrands(n), area, dev));
                }
            }
        }
        out.sort(Comparator.comparingInt((StrandOption o) -> o.wire().strandsInHand())
                .thenComparingDouble(o -> Math.abs(o.relativeDeviation())));
        return List.copyOf(out);
    }
}
