package coilwright.machine;

import coilwright.conductor.FillCheck;
import coilwright.conductor.InductanceEstimate;
import coilwright.conductor.PhaseResistance;
import coilwright.conductor.PhaseWinding;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.GapField;
import coilwright.magnet.GapFieldCalculator;
import coilwright.magnet.HarmonicAmplitude;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Builds an {@link Alternator} from its {@link AlternatorSpec}. */
public final class AlternatorModel {

    /** Uncertainty given to an entered inductance: a meter reading at a test frequency, not at the running point. common practice */
    public static final double ENTERED_INDUCTANCE_UNCERTAINTY = 0.10;

    private AlternatorModel() {
    }

    /**
     * Derives the machine constants.
     * <p>EMF equation: E_ph,rms = sqrt(2) pi f N_ph kw1 Phi1, with f = p n / 60 (Faraday's law for a sinusoidal flux
     * linkage; e.g. Hendershot &amp; Miller 2010, ch. 5). The flux per pole Phi1 is the fundamental of the 2-D
     * harmonic field solution; kw1 includes skew. Line EMF is sqrt(3) E_ph in star, E_ph in delta.
     *
     * @throws InvalidInputException      when a part is out of range (fields under their part's name)
     * @throws InfeasibleDesignException  when the winding cannot be balanced, the magnets or coils do not fit, or the
     *                                    wire cannot fit its window
     */
    public static Alternator build(AlternatorSpec spec) {
        Winding winding = within("winding", () -> StarOfSlots.layout(spec.winding()));
        GapField field = within("rotor", () -> GapFieldCalculator.solve(spec.rotor(), spec.winding().poles(),
                spec.winding().slots(), spec.magnetTempC()));

        CoilGeometry geometry = spec.rotor() instanceof RadialSurfaceRotor r
                ? CoilGeometry.slotted(r, (SlottedStator) spec.stator(), winding)
                : CoilGeometry.airCored((AxialDualRotor) spec.rotor(), (AirCoredStator) spec.stator(), winding);
        FillCheck fill = FillCheck.of(spec.turnsPerCoil(), spec.wire(), geometry.window()).requireFits();

        PhaseWinding phaseWinding = new PhaseWinding(spec.turnsPerCoil(), winding.coilsPerPhase(),
                spec.winding().parallelPaths(), geometry.meanTurnLengthM(), spec.wire());
        PhaseResistance resistance = PhaseResistance.of(phaseWinding, spec.windingTempC());
        int nPh = phaseWinding.seriesTurnsPerPhase();

        int p = spec.winding().polePairs();
        double computedKePh = EmfEquation.phaseRmsV(EmfEquation.frequencyHz(p, 1.0), nPh,
                winding.fundamentalTotalFactor(), field.fluxPerPoleWb());
        double lineFactor = spec.winding().phases() == 3 && spec.connection() == Connection.STAR ? Math.sqrt(3) : 1.0;
        boolean measured = spec.measuredKeLineVPerRpm() > 0;
        double keLine = measured ? spec.measuredKeLineVPerRpm() : computedKePh * lineFactor;
        double kePh = keLine / lineFactor;
        double kePhVsPerRad = kePh * 60.0 / (2 * Math.PI);
        double kt = spec.winding().phases() * kePhVsPerRad;

        double coilPitchFactor = Math.abs(Math.sin(Math.toRadians(winding.coilPitchSlots() * winding.slotAngleElecDeg()) / 2));
        double emfPerCoil = EmfEquation.phaseRmsV(EmfEquation.frequencyHz(p, 1.0), spec.turnsPerCoil(), coilPitchFactor,
                field.fluxPerPoleWb()) * (kePh / computedKePh);

        InductanceEstimate inductance;
        if (spec.phaseInductanceH() > 0) {
            inductance = new InductanceEstimate(spec.phaseInductanceH(), ENTERED_INDUCTANCE_UNCERTAINTY,
                    "entered (measured); a bridge or LCR reading is taken as good to 10 %");
        } else if (spec.rotor() instanceof RadialSurfaceRotor r) {
            inductance = CoilGeometry.estimateSlotted(r, (SlottedStator) spec.stator(), winding, field, nPh,
                    geometry.meanTurnLengthM());
        } else {
            inductance = CoilGeometry.estimateAirCored((AxialDualRotor) spec.rotor(), (AirCoredStator) spec.stator(),
                    winding, spec.turnsPerCoil(), geometry.meanTurnLengthM());
        }

        List<EmfHarmonic> harmonics = harmonics(winding, field);
        List<String> warnings = new ArrayList<>(field.warnings());
        boolean hot = !spec.insulationClass().allows(spec.windingTempC());
        if (hot) {
            warnings.add(String.format(Locale.ROOT, "windingTempC = %.0f C is above the %.0f C limit of insulation class %s (IEC 60085)",
                    spec.windingTempC(), spec.insulationClass().limitC(), spec.insulationClass().name()));
        }
        if (fill.level() == FillCheck.Level.HIGH) {
            warnings.add(String.format(Locale.ROOT, "Coil fill %.2f is above the practical limit %.2f (%s): winding it will be hard",
                    fill.basis() == FillCheck.Basis.COPPER_FILL ? fill.copperFill() : fill.wireFill(), fill.practicalLimit(),
                    fill.basis() == FillCheck.Basis.COPPER_FILL ? "copper fill" : "wire fill"));
        }
        if (measured) {
            warnings.add(String.format(Locale.ROOT, "Measured Ke %.4f V/rpm (line) used; the computed value is %.4f V/rpm (%+.1f %%)",
                    keLine, computedKePh * lineFactor, 100 * (keLine / (computedKePh * lineFactor) - 1)));
        }
        return new Alternator(spec, winding, field, nPh, computedKePh, kePh, keLine, kePhVsPerRad, kt, measured,
                emfPerCoil, geometry.meanTurnLengthM(), resistance, fill, inductance,
                resistance.copperMassTotalKg(spec.winding().phases()), field.magnetMassKg(), harmonics, hot, warnings);
    }

    private static List<EmfHarmonic> harmonics(Winding winding, GapField field) {
        double b1 = field.amplitudeT(1);
        List<EmfHarmonic> out = new ArrayList<>();
        for (HarmonicAmplitude h : field.harmonicAmplitudes()) {
            if (h.order() == 1) {
                continue;
            }
            double ratio = b1 > 0 ? h.amplitudeT() / b1 : 0;
            out.add(new EmfHarmonic(h.order(), winding.harmonic(h.order()).totalFactor(), ratio,
                    winding.emfHarmonicRatio(h.order(), ratio)));
        }
        return out;
    }

    /** Runs a part's calculation, placing its field errors under the part's name. */
    private static <T> T within(String part, java.util.function.Supplier<T> calc) {
        try {
            return calc.get();
        } catch (InvalidInputException e) {
            throw e.under(part);
        } catch (InfeasibleDesignException e) {
            String f = e.field().isEmpty() ? part : part + "." + e.field();
            throw new InfeasibleDesignException(f, e.getMessage());
        }
    }
}
