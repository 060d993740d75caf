package coilwright.safety;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The cautions that apply to a design. Every result carries them; each defers to local codes and
 * licensed practice.
 */
public final class Cautions {

    /**
     * Extra-low voltage limits: 50 V AC rms and 120 V ripple-free DC.
     * source: IEC 61140:2016 and IEC 60449 (voltage band I).
     */
    public static final double ELV_AC_RMS_V = 50.0;
    public static final double ELV_DC_V = 120.0;

    /** Third-harmonic EMF above this share of the fundamental drives a noticeable circulating current in delta. common practice */
    public static final double DELTA_THIRD_HARMONIC_LIMIT = 0.02;

    /** Magnet mass above which rotor assembly needs jigs rather than hands. common practice */
    public static final double MAGNET_JIG_MASS_KG = 0.5;

    public static final String DEFER = "Follow local electrical codes and licensed practice; these are engineering "
            + "cautions, not an installation approval.";

    private Cautions() {
    }

    /** The cautions that apply, most serious first. */
    public static List<Caution> assess(SafetyInputs in) {
        List<Caution> out = new ArrayList<>();
        openCircuitVoltage(in, out);
        if (in.batteryCharging()) {
            out.add(new Caution("DIVERSION_LOAD", Caution.Severity.WARNING, "Diversion load",
                    String.format(Locale.ROOT, "A battery that is full stops taking current and the turbine then "
                            + "runs towards its free-spinning speed. Fit a charge controller with a diversion (dump) load "
                            + "rated for the full output, at least %.0f W here, that fails safe: if the controller fails, "
                            + "the load must stay connected. Never disconnect an unloaded turbine.", in.maxOutputPowerW()),
                    "IEC 61400-2 (protection and shutdown); NEC Article 694 (small wind)"));
            out.add(new Caution("DC_FUSING", Caution.Severity.WARNING, "DC-rated fusing at the battery",
                    String.format(Locale.ROOT, "Put a DC-rated fuse or breaker in the positive lead as close to the battery "
                            + "as practical, rated above the largest charging current (%.1f A here) and able to interrupt "
                            + "the battery's short-circuit current. AC-rated parts may not break a DC arc.", in.maxDcCurrentA()),
                    "NEC Article 694 and 706; IEC 60364-7-712 practice"));
        }
        if (in.leadAcid()) {
            out.add(new Caution("BATTERY_VENTILATION", Caution.Severity.WARNING, "Battery ventilation",
                    "Lead-acid batteries give off hydrogen while charging, most near the absorb voltage. Ventilate the "
                            + "battery space and keep sparks and flames away.",
                    "IEC 62485-2 (ventilation of stationary batteries)"));
        }
        magnets(in, out);
        if (in.deltaConnected() && in.thirdHarmonicEmfRatio() > DELTA_THIRD_HARMONIC_LIMIT) {
            out.add(new Caution("DELTA_CIRCULATING_CURRENT", Caution.Severity.NOTICE, "Circulating current in delta",
                    String.format(Locale.ROOT, "The third-harmonic EMF is %.1f %% of the fundamental. In delta it drives a "
                            + "current round the closed delta even with no load, heating the winding and dragging the rotor. "
                            + "Consider star connection.", 100 * in.thirdHarmonicEmfRatio()), "common practice"));
        }
        if (in.windingOverTemperature()) {
            out.add(new Caution("WINDING_TEMPERATURE", Caution.Severity.WARNING, "Winding temperature",
                    "The working winding temperature is above the insulation's thermal class. Use a higher class of "
                            + "magnet wire or reduce the current.", "IEC 60085 thermal classes"));
        }
        out.add(new Caution("ROTATING_PARTS", Caution.Severity.NOTICE, "Rotating parts",
                "Guard the rotor and keep people clear of the turbine while it turns; provide a way to stop it "
                        + "(brake or short-circuit switch) before working on it.", "IEC 61400-2"));
        out.sort(Comparator.comparing(Caution::severity));
        return List.copyOf(out);
    }

    private static void openCircuitVoltage(SafetyInputs in, List<Caution> out) {
        double acV = in.openCircuitLineRmsV();
        double dcPeakV = Math.sqrt(2) * acV;
        boolean aboveElv = acV > ELV_AC_RMS_V || dcPeakV > ELV_DC_V;
        String text = String.format(Locale.ROOT, "Open-circuit line voltage at %.0f rpm (%s): %.1f V AC rms, "
                        + "%.1f V peak after the rectifier.", in.checkSpeedRpm(), in.checkSpeedSource(), acV, dcPeakV);
        if (aboveElv) {
            out.add(new Caution("OPEN_CIRCUIT_VOLTAGE", Caution.Severity.DANGER, "Dangerous open-circuit voltage",
                    text + " This is above extra-low voltage (50 V AC rms, 120 V DC). Wire, isolate and label the "
                            + "alternator, cable and controller as for mains voltage; an open circuit at high speed can "
                            + "give a shock or hold a DC arc. " + DEFER,
                    "IEC 61140 / IEC 60449 voltage bands; NEC Article 694"));
        } else {
            out.add(new Caution("OPEN_CIRCUIT_VOLTAGE", Caution.Severity.NOTICE, "Open-circuit voltage",
                    text + " This stays within extra-low voltage (50 V AC rms, 120 V DC), but an unloaded alternator "
                            + "still reaches it: keep it loaded. " + DEFER,
                    "IEC 61140 / IEC 60449 voltage bands"));
        }
    }

    private static void magnets(SafetyInputs in, List<Caution> out) {
        if (in.rareEarthMagnets()) {
            String jig = in.magnetMassKg() > MAGNET_JIG_MASS_KG
                    ? String.format(Locale.ROOT, " With %.1f kg of magnets, assemble the rotors with jigs and jacking screws, never by hand.", in.magnetMassKg())
                    : "";
            out.add(new Caution("MAGNET_HANDLING", Caution.Severity.WARNING, "Magnet handling",
                    "Neodymium magnets snap together with enough force to crush fingers and shatter. Wear eye protection, "
                            + "keep them away from pacemakers and from each other, and secure them on the rotor "
                            + "against the centrifugal force at the highest speed." + jig, "common practice"));
        }
        if (in.magnetOverTemperature()) {
            out.add(new Caution("MAGNET_TEMPERATURE", Caution.Severity.WARNING, "Magnet temperature",
                    "The magnet temperature is above the grade's maximum working temperature: the magnets may lose "
                            + "flux for good. Choose a grade with a higher temperature class or keep them cooler.",
                    "magnet grade data"));
        }
    }
}
