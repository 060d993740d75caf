package coilwright.sizing;

import coilwright.machine.AirCoredStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Proposes the axial-flux layouts of an {@link AxialBuild}: every disc diameter, stator thickness, magnet block and
 * count per pole, pole count and coil count, the coil counts being multiples of 3 from 3/4 to 3/2 of the pole
 * count (q = Q/(3 x 2p) from 1/4 to 1/2, the range of concentrated air-cored windings, common practice): with
 * fewer coils each would span several poles.
 */
final class AxialDrafts {
    private AxialDrafts() {
    }

    /** Number of combinations {@link #draft} walks through. */
    static long combinations(AxialBuild b) {
        long coilCounts = 0;
        for (int poles = b.minPoles(); poles <= b.maxPoles(); poles += 2) {
            coilCounts += Math.max(0, (maxCoils(poles) - minCoils(poles)) / 3 + 1);
        }
        long magnetChoices = b.magnets().stream().mapToLong(m -> m.countsPerPole().size()).sum();
        return b.discDiametersM().size() * (long) b.coilLayerThicknessesM().size() * magnetChoices * coilCounts;
    }

    static void draft(AxialBuild b, WindingCheck windings, Consumer<LayoutDraft> out,
                      EnumMap<LayoutRejection, Long> rejected) {
        for (double disc : b.discDiametersM()) {
            for (double stator : b.coilLayerThicknessesM()) {
                for (MagnetOption m : b.magnets()) {
                    for (int count : m.countsPerPole()) {
                        for (int poles = b.minPoles(); poles <= b.maxPoles(); poles += 2) {
                            Optional<AxialDualRotor> rotor = rotor(b, disc, stator, m, count, poles);
                            for (int coils = minCoils(poles); coils <= maxCoils(poles); coils += 3) {
                                WindingSpec w = WindingCheck.spec(coils, poles, Layers.DOUBLE);
                                Optional<LayoutRejection> bad = windings.rejection(w);
                                if (bad.isEmpty() && rotor.isEmpty()) {
                                    bad = Optional.of(LayoutRejection.MAGNETS_DO_NOT_FIT);
                                }
                                Optional<AirCoredStator> coilRing = bad.isEmpty()
                                        ? stator(rotor.get(), m.widthM(), coils, poles, b.coilGapM()) : Optional.empty();
                                if (bad.isEmpty() && coilRing.isEmpty()) {
                                    bad = Optional.of(LayoutRejection.COILS_DO_NOT_FIT);
                                }
                                if (bad.isPresent()) {
                                    rejected.merge(bad.get(), 1L, Long::sum);
                                } else {
                                    out.accept(new LayoutDraft(rotor.get(), coilRing.get(), w, String.format(Locale.ROOT,
                                            "%d coils / %d poles, %d x %s per pole, %.0f mm discs, %.1f mm stator",
                                            coils, poles, count, m.label(), disc * 1000, stator * 1000)));
                                }
                            }
                        }
                    }
                }
            }
        }
    }

    private static int maxCoils(int poles) {
        return Math.min(coilwright.winding.WindingSpec.MAX_SLOTS, 3 * poles / 2);
    }

    /** The smallest multiple of 3 at or above 3/4 of the poles (and at least 3). */
    private static int minCoils(int poles) {
        return Math.max(3, 3 * (int) Math.ceil(poles / 4.0));
    }

    /** Magnets with their outer edge at the disc radius less the rim margin; empty when they do not fit. */
    private static Optional<AxialDualRotor> rotor(AxialBuild b, double discM, double statorM, MagnetOption m, int count,
                                                  int poles) {
        double lengthM = count * m.lengthM();
        double centreM = discM / 2 - b.rimMarginM() - lengthM / 2;
        try {
            AxialDualRotor r = new AxialDualRotor(m.gradeName(), m.widthM(), lengthM, centreM, m.thicknessM(), statorM,
                    b.clearancePerSideM());
            r.checkFits(poles);
            return Optional.of(r);
        } catch (InvalidInputException | InfeasibleDesignException e) {
            return Optional.empty();
        }
    }

    /**
     * Coils side by side round the ring: the hole as wide as a magnet but at most a third of the room per coil, the
     * two legs sharing the rest at the magnets' inner radius, each at most half a pole pitch wide there (this
     * project's layout rule after common practice for air-cored stators: the model takes each leg as a line at its
     * centre, and a leg half a pole pitch wide already loses about 10 % of its EMF to its own breadth,
     * sin(pi/4)/(pi/4) = 0.90); empty when the legs would be thinner than 1 mm.
     */
    private static Optional<AirCoredStator> stator(AxialDualRotor r, double magnetWidthM, int coils, int poles,
                                                   double gapM) {
        // a hair under the full circumference, so the ring check never fails on rounding
        double roomInnerM = (2 * Math.PI * r.innerRadiusM() / coils - gapM) * (1 - 1e-9);
        double legM = Math.min((roomInnerM - Math.min(magnetWidthM, roomInnerM / 3)) / 2,
                Math.PI * r.innerRadiusM() / poles);
        double holeInnerM = roomInnerM - 2 * legM;
        double holeOuterM = (2 * Math.PI * r.outerRadiusM() / coils - gapM) * (1 - 1e-9) - 2 * legM;
        try {
            return Optional.of(AirCoredStator.ofOpeningEnds(legM, holeInnerM, holeOuterM));
        } catch (InvalidInputException e) {
            return Optional.empty();
        }
    }
}
