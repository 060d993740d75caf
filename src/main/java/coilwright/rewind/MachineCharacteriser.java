package coilwright.rewind;

import coilwright.conductor.Copper;
import coilwright.conductor.WireSpec;
import coilwright.machine.AlternatorModel;
import coilwright.machine.EmfEquation;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** Turns the readings taken on an existing machine into its constants: Ke, kw1*Phi1, phase resistance, mean turn length. */
public final class MachineCharacteriser {
    /** Longest plausible mean turn, m: a coil of a machine this tool is for is far smaller (common practice). */
    public static final double MAX_MEAN_TURN_LENGTH_M = 5.0;
    /** Below this mean turn a warning is given: small alternator coils are rarely under 30 mm round (common practice). */
    public static final double SMALL_MEAN_TURN_LENGTH_M = 0.030;

    /** Relative accuracy given to a measured inductance: a meter reading at its test frequency (common practice). */
    public static final double INDUCTANCE_UNCERTAINTY = AlternatorModel.ENTERED_INDUCTANCE_UNCERTAINTY;

    private MachineCharacteriser() {
    }

    /**
     * Characterises the machine from its readings.
     * <ul>
     * <li>Ke_LL = V_LL / n; Ke_ph = Ke_LL / (sqrt(3) in star, 1 in delta or single phase).</li>
     * <li>kw1 Phi1 = Ke_ph / (sqrt(2) pi (p/60) N_ph), from E_ph = sqrt(2) pi f N_ph kw1 Phi1, f = p n / 60.</li>
     * <li>R_ph = R_LL / 2 (star), 1.5 R_LL (delta), R_LL (single phase); R20 = R_ph / (1 + 0.00393 (T - 20)) (IEC 60028).</li>
     * <li>MLT = R_ph A a^2 / (rho(T) N_c C), from R_ph = rho(T) (N_c C MLT) / A / a^2 with N_c turns per coil,
     * C coils per phase, A the conductor's copper area (all strands) and a parallel paths.</li>
     * </ul>
     * Bands: first-order propagation (GUM) of the stated voltage, speed and resistance accuracies; temperature,
     * wire diameter and the counts are taken as exact.
     * Rule for an impossible resistance: the implied mean turn must be at least pi times the overall diameter of
     * the conductor (no turn is shorter than a circle round its own wire) and at most {@value #MAX_MEAN_TURN_LENGTH_M} m;
     * below {@value #SMALL_MEAN_TURN_LENGTH_M} m a warning is given.
     *
     * @param machine what is known, with measurements
     * @return the characterisation
     * @throws InvalidInputException (field {@code measurements}) when nothing was measured; (field
     *         {@code coilsPerPhase}) when the given count does not match the layout; (field
     *         {@code measurements.lineResistanceOhm}) when the resistance implies an impossible mean turn
     * @throws coilwright.validation.InfeasibleDesignException when the slots, poles and phases cannot be balanced
     */
    public static MachineCharacterisation characterise(ExistingMachine machine) {
        Measurements m = machine.measurementsIfTaken().orElseThrow(() -> new InvalidInputException(new FieldError(
                "measurements", "missing", "measurements is missing: an open-circuit line voltage at a known speed"
                + " is needed to find Ke (for a bare stator, list its pole options with StatorOptions)", "a value")));
        Winding w = StarOfSlots.layout(machine.windingSpec());
        if (machine.coilsPerPhase() > 0 && machine.coilsPerPhase() != w.coilsPerPhase()) {
            throw new InvalidInputException(new FieldError("coilsPerPhase", Integer.toString(machine.coilsPerPhase()),
                    String.format(Locale.ROOT, "coilsPerPhase = %d: a %s-layer %d-phase winding on %d slots has %d coils"
                                    + " per phase; check the layers and the coil count", machine.coilsPerPhase(),
                            machine.layers().name().toLowerCase(Locale.ROOT), machine.phases(), machine.slots(),
                            w.coilsPerPhase()), Integer.toString(w.coilsPerPhase())));
        }
        List<String> derived = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        int poles = machine.polesUsed();
        boolean inferred = machine.poles() == 0;
        if (m.hasFrequency()) {
            derived.add(String.format(Locale.ROOT, "pole count %s from %.1f Hz at %s rpm: %d poles (120 f / n = %.2f)",
                    inferred ? "inferred" : "checked", m.measuredFrequencyHz(), fmtRpm(m.measuredSpeedRpm()), poles,
                    m.impliedPoles()));
        }
        int nPh = w.coilsPerPhase() * machine.turnsPerCoil() / machine.parallelPaths();
        derived.add(String.format(Locale.ROOT, "series turns per phase %d = %d coils x %d turns / %d path(s), from the %s",
                nPh, w.coilsPerPhase(), machine.turnsPerCoil(), machine.parallelPaths(),
                machine.coilsPerPhase() > 0 ? "stated coil count (matches the layout)" : "star-of-slots layout"));

        double uKe = Band.quadrature(m.voltageAccuracyPercent() / 100, m.speedAccuracyPercent() / 100);
        double keLine = m.openCircuitLineVoltageRmsV() / m.measuredSpeedRpm();
        double lineFactor = Terminals.lineVoltageFactor(machine.phases(), machine.connection());
        double kePh = keLine / lineFactor;
        derived.add(String.format(Locale.ROOT, "Ke %.5f V/rpm (line, rms) from %.2f V at %s rpm, +-%.1f %%",
                keLine, m.openCircuitLineVoltageRmsV(), fmtRpm(m.measuredSpeedRpm()), 100 * uKe));
        double kwPhi = kePh / (EmfEquation.SQRT2_PI * EmfEquation.frequencyHz(poles / 2, 1.0) * nPh);
        derived.add(String.format(Locale.ROOT, "kw1 x Phi1 = %.4e Wb from the phase Ke, %d poles and %d series turns"
                + " (flux per pole %.4e Wb with kw1 = %.4f)", kwPhi, poles, nPh, kwPhi / w.fundamentalTotalFactor(),
                w.fundamentalTotalFactor()));

        Optional<Band> rPh = Optional.empty();
        Optional<Band> r20 = Optional.empty();
        Optional<Band> mlt = Optional.empty();
        if (m.hasResistance()) {
            double uR = m.resistanceAccuracyPercent() / 100;
            double phaseR = m.lineResistanceOhm() / Terminals.lineResistanceFactor(machine.phases(), machine.connection());
            rPh = Optional.of(Band.of(phaseR, uR));
            r20 = Optional.of(Band.of(phaseR / Copper.resistanceRatio(m.measuredTemperatureC()), uR));
            double mltM = meanTurnLengthM(machine, w.coilsPerPhase(), phaseR, m.measuredTemperatureC());
            checkMeanTurn(machine, mltM, warnings);
            mlt = Optional.of(Band.of(mltM, uR));
            derived.add(String.format(Locale.ROOT, "phase resistance %.5f Ohm from %.5f Ohm between line terminals"
                            + " (%s) at %.1f C", phaseR, m.lineResistanceOhm(), connectionText(machine),
                    m.measuredTemperatureC()));
            derived.add(String.format(Locale.ROOT, "mean turn length %.4f m from the phase resistance, %d x %d turns of %s"
                    + " and %d path(s), +-%.1f %%", mltM, w.coilsPerPhase(), machine.turnsPerCoil(),
                    machine.wire().label(), machine.parallelPaths(), 100 * uR));
        } else {
            warnings.add("no resistance measured: the mean turn length, resistance, current and copper loss of the"
                    + " options are not predicted");
        }
        Optional<Band> inductance = Optional.empty();
        if (m.hasInductance()) {
            double lPh = m.lineInductanceH() / Terminals.lineResistanceFactor(machine.phases(), machine.connection());
            inductance = Optional.of(Band.of(lPh, INDUCTANCE_UNCERTAINTY));
            derived.add(String.format(Locale.ROOT, "phase inductance %.3e H from %.3e H between line terminals, +-%.0f %%",
                    lPh, m.lineInductanceH(), 100 * INDUCTANCE_UNCERTAINTY));
        }
        return new MachineCharacterisation(poles, inferred, w.coilsPerPhase(), machine.parallelPaths(), nPh,
                w.coilPitchSlots(), w.fundamentalWindingFactor(), w.thirdHarmonicFactor().windingFactor(),
                StarOfSlots.allowedParallelPaths(machine.windingSpec()), Band.of(keLine, uKe), Band.of(kePh, uKe),
                Band.of(kwPhi, uKe), rPh, r20, mlt, inductance, m.measuredTemperatureC(), derived, warnings);
    }

    /** MLT = R_ph A a^2 / (rho(T) N_c C), m. */
    static double meanTurnLengthM(ExistingMachine machine, int coilsPerPhase, double phaseResistanceOhm,
                                  double temperatureC) {
        double a = machine.parallelPaths();
        return phaseResistanceOhm * machine.wire().conductorCopperAreaM2() * a * a
                / (Copper.resistivityOhmM(temperatureC) * machine.turnsPerCoil() * coilsPerPhase);
    }

    private static void checkMeanTurn(ExistingMachine machine, double mltM, List<String> warnings) {
        WireSpec wire = machine.wire();
        double minM = Math.PI * wire.overallDiameterM() * Math.sqrt(wire.strandsInHand());
        String given = String.format(Locale.ROOT, "%d turns per coil of %s, %d path(s)", machine.turnsPerCoil(),
                wire.label(), machine.parallelPaths());
        String value = Double.toString(machine.measurements().lineResistanceOhm());
        if (mltM < minM) {
            throw new InvalidInputException(new FieldError("measurements.lineResistanceOhm", value, String.format(
                    Locale.ROOT, "measurements.lineResistanceOhm = %s: too low for %s: it implies a mean turn of %.2e m,"
                            + " shorter than a circle round the wire itself (%.2e m); check the turns, coils, paths,"
                            + " wire and the reading (line-to-line, not per phase)", value, given, mltM, minM),
                    String.format(Locale.ROOT, "a resistance implying a mean turn of %.2e to %.1f m", minM,
                            MAX_MEAN_TURN_LENGTH_M)));
        }
        if (mltM > MAX_MEAN_TURN_LENGTH_M) {
            throw new InvalidInputException(new FieldError("measurements.lineResistanceOhm", value, String.format(
                    Locale.ROOT, "measurements.lineResistanceOhm = %s: too high for %s: it implies a mean turn of"
                            + " %.2f m, longer than %.1f m; check the turns, coils, paths, wire and the reading",
                    value, given, mltM, MAX_MEAN_TURN_LENGTH_M), String.format(Locale.ROOT,
                    "a resistance implying a mean turn of %.2e to %.1f m", minM, MAX_MEAN_TURN_LENGTH_M)));
        }
        if (mltM < SMALL_MEAN_TURN_LENGTH_M) {
            warnings.add(String.format(Locale.ROOT, "the measured resistance implies a mean turn of only %.1f mm;"
                    + " check the turns, coils per phase, paths and wire", 1000 * mltM));
        }
    }

    private static String connectionText(ExistingMachine machine) {
        if (machine.phases() == 1) {
            return "single phase: R_ph = R_LL";
        }
        return switch (machine.connection()) {
            case STAR -> "star: R_ph = R_LL / 2";
            case DELTA -> "delta: R_ph = 1.5 R_LL";
        };
    }

    static String fmtRpm(double rpm) {
        return rpm == Math.rint(rpm) ? String.format(Locale.ROOT, "%.0f", rpm) : String.format(Locale.ROOT, "%.1f", rpm);
    }
}
