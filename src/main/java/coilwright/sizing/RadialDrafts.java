package coilwright.sizing;

import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

/** Proposes the radial layouts of a {@link RadialBuild}: every magnet block and count per pole, pole count and layer. */
final class RadialDrafts {
    private RadialDrafts() {
    }

    /** Number of combinations {@link #draft} walks through. */
    static long combinations(RadialBuild b) {
        long magnetChoices = b.magnets().stream().mapToLong(m -> m.countsPerPole().size()).sum();
        return magnetChoices * ((b.maxPoles() - b.minPoles()) / 2 + 1) * b.layers().size();
    }

    static void draft(RadialBuild b, WindingCheck windings, Consumer<LayoutDraft> out,
                      EnumMap<LayoutRejection, Long> rejected) {
        double magnetRadiusM = b.side() == RotorSide.INNER ? b.gapDiameterM() / 2 - b.airGapM()
                : b.gapDiameterM() / 2 + b.airGapM();
        for (MagnetOption m : b.magnets()) {
            for (int count : m.countsPerPole()) {
                for (int poles = b.minPoles(); poles <= b.maxPoles(); poles += 2) {
                    double arcRatio = count * m.widthM() / (2 * Math.PI * magnetRadiusM / poles);
                    for (Layers layers : b.layers()) {
                        WindingSpec w = WindingCheck.spec(b.slots(), poles, layers);
                        Optional<LayoutRejection> bad = windings.rejection(w);
                        if (bad.isEmpty() && (arcRatio < 0.3 || arcRatio > 1.0)) {
                            bad = Optional.of(LayoutRejection.MAGNET_ARC_OUT_OF_RANGE);
                        }
                        Optional<RadialSurfaceRotor> rotor = bad.isEmpty() ? rotor(b, m, arcRatio) : Optional.empty();
                        if (bad.isEmpty() && rotor.isEmpty()) {
                            bad = Optional.of(LayoutRejection.MAGNETS_DO_NOT_FIT);
                        }
                        if (bad.isPresent()) {
                            rejected.merge(bad.get(), 1L, Long::sum);
                        } else {
                            out.accept(new LayoutDraft(rotor.get(), b.stator(), w, String.format(Locale.ROOT,
                                    "%d slots / %d poles %s layer, %d x %s per pole (pole arc %.2f)", b.slots(), poles,
                                    layers.name().toLowerCase(Locale.ROOT), count, m.label(), arcRatio)));
                        }
                    }
                }
            }
        }
    }

    private static Optional<RadialSurfaceRotor> rotor(RadialBuild b, MagnetOption m, double arcRatio) {
        try {
            return Optional.of(new RadialSurfaceRotor(b.side(), m.gradeName(), b.gapDiameterM(), b.stackLengthM(),
                    b.airGapM(), m.thicknessM(), arcRatio, b.slotOpeningM()));
        } catch (InvalidInputException | InfeasibleDesignException e) {
            return Optional.empty();
        }
    }
}
