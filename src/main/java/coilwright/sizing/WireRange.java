package coilwright.sizing;

import coilwright.conductor.WireCatalogue;
import coilwright.conductor.WireGauge;
import coilwright.conductor.WireSize;
import coilwright.conductor.WireSpec;
import coilwright.validation.Checks;

import java.util.List;

/**
 * The magnet wire the builder can get: a range of AWG gauges or of metric diameters (the preferred sizes of
 * {@link WireCatalogue#metricSizes(int)} inside it), up to a number of strands in hand.
 *
 * @param gauge            AWG or METRIC
 * @param thickestAwg      AWG: the thickest gauge (smallest number), 4 to 40
 * @param thinnestAwg      AWG: the thinnest gauge (largest number), thickestAwg to 40
 * @param minDiameterM     METRIC: smallest bare diameter, m, 0.1 mm to 3 mm
 * @param maxDiameterM     METRIC: largest bare diameter, m, minDiameterM to 3 mm
 * @param maxStrands       most strands in hand, 1 to 12
 * @param insulationGrade  enamel grade, 1 or 2 (IEC 60317-0-1)
 */
public record WireRange(WireGauge gauge, int thickestAwg, int thinnestAwg, double minDiameterM, double maxDiameterM,
                        int maxStrands, int insulationGrade) {
    /** Most strands in hand the search tries. */
    public static final int MAX_STRANDS = 12;

    public WireRange {
        Checks c = new Checks().present("gauge", gauge).intRange("maxStrands", maxStrands, 1, MAX_STRANDS)
                .intRange("insulationGrade", insulationGrade, 1, 2);
        if (gauge == WireGauge.AWG) {
            c.intRange("thickestAwg", thickestAwg, WireSize.MIN_AWG, WireSize.MAX_AWG)
                    .intRange("thinnestAwg", thinnestAwg, WireSize.MIN_AWG, WireSize.MAX_AWG)
                    .require(thinnestAwg >= thickestAwg, "thinnestAwg", thinnestAwg,
                            "must be at least thickestAwg = " + thickestAwg + " (a larger gauge number is thinner)",
                            ">= thickestAwg");
        } else if (gauge == WireGauge.METRIC) {
            c.range("minDiameterM", minDiameterM, WireSize.MIN_METRIC_DIAMETER_M, WireSize.MAX_METRIC_DIAMETER_M)
                    .range("maxDiameterM", maxDiameterM, WireSize.MIN_METRIC_DIAMETER_M, WireSize.MAX_METRIC_DIAMETER_M);
            if (!c.hasErrors()) {
                c.require(maxDiameterM >= minDiameterM, "maxDiameterM", maxDiameterM,
                        "must be at least minDiameterM = " + Checks.fmt(minDiameterM), ">= minDiameterM");
            }
        }
        c.throwIfAny();
        if (sizes(gauge, thickestAwg, thinnestAwg, minDiameterM, maxDiameterM, insulationGrade).isEmpty()) {
            c.require(false, "maxDiameterM", maxDiameterM, "no preferred metric size lies between "
                    + Checks.fmt(minDiameterM) + " and " + Checks.fmt(maxDiameterM) + " m", "a wider range");
        }
        c.throwIfAny();
    }

    /** An AWG range with enamel grade 2. */
    public static WireRange awg(int thickestAwg, int thinnestAwg, int maxStrands) {
        return new WireRange(WireGauge.AWG, thickestAwg, thinnestAwg, 0, 0, maxStrands, 2);
    }

    /** A metric range with enamel grade 2. */
    public static WireRange metric(double minDiameterM, double maxDiameterM, int maxStrands) {
        return new WireRange(WireGauge.METRIC, 0, 0, minDiameterM, maxDiameterM, maxStrands, 2);
    }

    /** The single-strand sizes in the range, thickest first. */
    public List<WireSpec> sizes() {
        return sizes(gauge, thickestAwg, thinnestAwg, minDiameterM, maxDiameterM, insulationGrade);
    }

    private static List<WireSpec> sizes(WireGauge gauge, int thickestAwg, int thinnestAwg, double minDiameterM,
                                        double maxDiameterM, int grade) {
        if (gauge == WireGauge.AWG) {
            return WireCatalogue.awgSizes(grade).stream()
                    .filter(w -> w.awg() >= thickestAwg && w.awg() <= thinnestAwg).toList();
        }
        return WireCatalogue.metricSizes(grade).stream()
                .filter(w -> w.bareDiameterM() >= minDiameterM * (1 - 1e-9) && w.bareDiameterM() <= maxDiameterM * (1 + 1e-9))
                .sorted((a, b) -> Double.compare(b.bareDiameterM(), a.bareDiameterM())).toList();
    }
}
