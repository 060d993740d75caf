package coilwright.conductor;

import coilwright.validation.Checks;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * One round enamelled copper conductor as wound: a wire size (AWG or metric), its enamel grade and how
 * many strands are wound in hand (in parallel, side by side, as one conductor).
 *
 * <p>The record is kept canonical: for {@link WireGauge#AWG} the given {@code bareDiameterM} is ignored and
 * replaced by the ASTM B258 diameter of {@code awg}; for {@link WireGauge#METRIC} {@code awg} is set to 0.
 * So {@link #bareDiameterM()} is always the bare diameter of one strand.
 *
 * @param gauge           how the size is stated
 * @param awg             gauge number, {@value WireSize#MIN_AWG} to {@value WireSize#MAX_AWG} (used when AWG)
 * @param bareDiameterM   nominal bare diameter, 0.10 mm to 3.00 mm (used when METRIC), m
 * @param insulationGrade enamel grade per IEC 60317-0-1, 1 (thin) or 2 (thick)
 * @param strandsInHand   strands wound together as one conductor, 1 to 40
 */
public record WireSpec(WireGauge gauge, int awg, double bareDiameterM, int insulationGrade, int strandsInHand) {
    /** Most strands in hand accepted. */
    public static final int MAX_STRANDS = 40;

    public WireSpec {
        Checks c = new Checks().present("gauge", gauge);
        if (gauge == WireGauge.AWG) {
            c.intRange("awg", awg, WireSize.MIN_AWG, WireSize.MAX_AWG);
        } else if (gauge == WireGauge.METRIC) {
            c.range("bareDiameterM", bareDiameterM, WireSize.MIN_METRIC_DIAMETER_M, WireSize.MAX_METRIC_DIAMETER_M);
        }
        c.intRange("insulationGrade", insulationGrade, 1, 2);
        c.intRange("strandsInHand", strandsInHand, 1, MAX_STRANDS);
        c.throwIfAny();
        if (gauge == WireGauge.AWG) {
            bareDiameterM = WireSize.awgDiameterM(awg);
        } else {
            awg = 0;
        }
    }

    /** A single-strand AWG wire. */
    public static WireSpec awg(int awg, int insulationGrade) {
        return new WireSpec(WireGauge.AWG, awg, 0.0, insulationGrade, 1);
    }

    /** A single-strand metric wire of bare diameter {@code bareDiameterM}, m. */
    public static WireSpec metric(double bareDiameterM, int insulationGrade) {
        return new WireSpec(WireGauge.METRIC, 0, bareDiameterM, insulationGrade, 1);
    }

    /** The same wire with {@code strands} strands in hand. */
    public WireSpec withStrands(int strands) {
        return new WireSpec(gauge, awg, bareDiameterM, insulationGrade, strands);
    }

    /** The same wire with another enamel grade. */
    public WireSpec withInsulationGrade(int grade) {
        return new WireSpec(gauge, awg, bareDiameterM, grade, strandsInHand);
    }

    /** Maximum overall diameter of one strand over the enamel (IEC 60317-0-1 grade 1 or 2), m. */
    public double overallDiameterM() {
        return WireSize.overallDiameterM(bareDiameterM, insulationGrade);
    }

    /** Copper cross-section of one strand, pi*d^2/4, m^2. */
    public double copperAreaM2() {
        return Math.PI * bareDiameterM * bareDiameterM / 4.0;
    }

    /** Copper cross-section of the whole conductor (all strands in hand), m^2. */
    public double conductorCopperAreaM2() {
        return strandsInHand * copperAreaM2();
    }

    /** Area of the circles of the enamelled strands of one conductor, strands * pi*d_overall^2/4, m^2. */
    public double conductorOverallAreaM2() {
        double d = overallDiameterM();
        return strandsInHand * Math.PI * d * d / 4.0;
    }

    /** A short name: "AWG 18", "1.25 mm", with "3 x " in front for strands in hand. */
    public String label() {
        String size = gauge == WireGauge.AWG ? "AWG " + awg : mmText(bareDiameterM) + " mm";
        return strandsInHand == 1 ? size : strandsInHand + " x " + size;
    }

    private static String mmText(double m) {
        BigDecimal mm = BigDecimal.valueOf(m * 1000.0).setScale(3, RoundingMode.HALF_UP).stripTrailingZeros();
        return mm.scale() < 2 ? mm.setScale(2, RoundingMode.UNNECESSARY).toPlainString() : mm.toPlainString();
    }
}
