package coilwright.safety;

import coilwright.conductor.ThermalClass;
import coilwright.demag.DemagnetisationCheck;
import coilwright.demag.Verdict;
import coilwright.validation.Checks;

import java.util.Locale;
import java.util.Optional;

/**
 * Cautions built from the machine's physical limits: magnet demagnetisation under a fault, winding temperature
 * against the insulation class, and a rotor held still by cogging and friction. Each returns empty when nothing
 * needs saying.
 */
public final class MachineLimitCautions {
    /** Within this many kelvin below the class limit the winding temperature gets a notice (common practice). */
    public static final double WINDING_NOTICE_BAND_K = 10.0;

    private MachineLimitCautions() {
    }

    /** DANGER when the worst-case fault crosses the magnets' knee, WARNING when the margin is thin. */
    public static Optional<Caution> demagnetisation(DemagnetisationCheck check) {
        new Checks().present("check", check).throwIfAny();
        if (check.verdict() == Verdict.OK) {
            return Optional.empty();
        }
        boolean danger = check.verdict() == Verdict.DANGER;
        String what = danger
                ? "A short circuit across the alternator's terminals at its highest speed would demagnetise the magnets "
                + "for good: the EMF and output would drop and not come back. "
                : "A short circuit at the highest speed would bring the magnets close to their demagnetisation knee. ";
        return Optional.of(new Caution("MAGNET_DEMAGNETISATION", danger ? Caution.Severity.DANGER : Caution.Severity.WARNING,
                danger ? "Magnets would be demagnetised by a short circuit" : "Thin demagnetisation margin",
                what + check.summary() + ". Use a grade with higher coercivity (H, SH, UH), thicker magnets, keep them "
                        + "cooler, or limit the speed and fault current. Do not use a dead short as a brake at high "
                        + "speed." + (danger ? "" : " Ferrite is weakest when cold."),
                "magnet grade data (HcJ and its temperature coefficient); IEC 60909-0 peak short-circuit current"));
    }

    /**
     * WARNING above the insulation class, NOTICE within {@link #WINDING_NOTICE_BAND_K} of it.
     *
     * @param hotSpotC        steady hot-spot winding temperature, C
     * @param insulationClass the winding's thermal class
     * @param where           the operating point, in words (e.g. "at 12 m/s")
     * @param fixedByUser     true when the temperature was entered rather than solved
     */
    public static Optional<Caution> windingTemperature(double hotSpotC, ThermalClass insulationClass, String where,
                                                       boolean fixedByUser) {
        new Checks().range("hotSpotC", hotSpotC, -60, 1000).present("insulationClass", insulationClass).throwIfAny();
        double limit = insulationClass.limitC();
        String basis = fixedByUser ? "the winding temperature you entered" : "the steady winding temperature from the "
                + "thermal model (uncertain by about a third of the rise)";
        if (hotSpotC > limit) {
            return Optional.of(new Caution("WINDING_OVER_TEMPERATURE", Caution.Severity.WARNING,
                    "Winding above its insulation class", String.format(Locale.ROOT, "%s %s is %.0f C, above the "
                            + "%.0f C of insulation class %s: the enamel ages fast and the winding can fail. Reduce "
                            + "the current (more turns of thinner wire will not help; more copper or better cooling "
                            + "will), or use wire of a higher class.", cap(basis), where, hotSpotC, limit,
                            insulationClass.name()), "IEC 60085 thermal classes"));
        }
        if (hotSpotC > limit - WINDING_NOTICE_BAND_K) {
            return Optional.of(new Caution("WINDING_NEAR_LIMIT", Caution.Severity.NOTICE, "Winding near its limit",
                    String.format(Locale.ROOT, "%s %s is %.0f C, within %.0f K of the %.0f C limit of class %s.",
                            cap(basis), where, hotSpotC, WINDING_NOTICE_BAND_K, limit, insulationClass.name()),
                    "IEC 60085 thermal classes"));
        }
        return Optional.empty();
    }

    /**
     * NOTICE when the rotor needs more wind to start turning than to start charging; WARNING when it needs more
     * than {@code hardStartWindMs}.
     *
     * @param startsTurningAtMs    wind speed that overcomes cogging and break-away friction, m/s
     * @param chargingStartsAtMs   wind speed at which charging begins once turning, m/s
     * @param hardStartWindMs      a starting wind speed beyond which the turbine will rarely start at the site, m/s
     */
    public static Optional<Caution> starting(double startsTurningAtMs, double chargingStartsAtMs,
                                             double hardStartWindMs) {
        new Checks().nonNegative("startsTurningAtMs", startsTurningAtMs).nonNegative("chargingStartsAtMs",
                chargingStartsAtMs).positive("hardStartWindMs", hardStartWindMs).throwIfAny();
        if (startsTurningAtMs > hardStartWindMs) {
            return Optional.of(new Caution("HARD_START", Caution.Severity.WARNING, "Rotor may not start",
                    String.format(Locale.ROOT, "Held still, the rotor needs %.1f m/s to overcome cogging and bearing "
                            + "friction, more than the %.1f m/s it would rarely see here. Skew the magnets or slots, "
                            + "choose a slot and pole combination with a higher LCM, or a rotor with more starting "
                            + "torque.", startsTurningAtMs, hardStartWindMs), "common practice"));
        }
        if (startsTurningAtMs > chargingStartsAtMs) {
            return Optional.of(new Caution("START_ABOVE_CUT_IN", Caution.Severity.NOTICE, "Starts later than it charges",
                    String.format(Locale.ROOT, "The rotor starts turning only at %.1f m/s, though once turning it "
                            + "charges from %.1f m/s: in light wind it stays still until a gust frees it.",
                            startsTurningAtMs, chargingStartsAtMs), "common practice"));
        }
        return Optional.empty();
    }

    private static String cap(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
