package coilwright.magnet;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.Locale;

/**
 * Radial-flux rotor with surface-mounted, radially magnetised magnets facing a slotted iron stator.
 *
 * @param side              {@link RotorSide#INNER} (rotor in the stator bore) or {@link RotorSide#OUTER}
 * @param gradeName         magnet grade, one of {@link MagnetGrades#names()}
 * @param gapDiameterM      stator surface diameter facing the magnets: the bore for an inner rotor, the stator
 *                          outer diameter for an outer rotor; 0.01 to 5 m
 * @param stackLengthM      axial length of stator stack and magnets, 0.002 to 2 m
 * @param airGapM           mechanical gap from stator iron to magnet surface, 0.0001 to 0.05 m
 * @param magnetThicknessM  radial magnet thickness, 0.0005 to 0.1 m
 * @param poleArcRatio      magnet arc / pole pitch, 0.3 to 1.0
 * @param slotOpeningM      stator slot opening width at the gap, 0 (smooth stator) to 0.1 m
 */
public record RadialSurfaceRotor(RotorSide side, String gradeName, double gapDiameterM, double stackLengthM,
                                 double airGapM, double magnetThicknessM, double poleArcRatio, double slotOpeningM)
        implements RotorSpec {

    public RadialSurfaceRotor {
        Checks c = new Checks();
        c.present("side", side);
        MagnetGrades.checkName(c, "gradeName", gradeName);
        c.range("gapDiameterM", gapDiameterM, 0.01, 5.0);
        c.range("stackLengthM", stackLengthM, 0.002, 2.0);
        c.range("airGapM", airGapM, 0.0001, 0.05);
        c.range("magnetThicknessM", magnetThicknessM, 0.0005, 0.1);
        c.range("poleArcRatio", poleArcRatio, 0.3, 1.0);
        c.range("slotOpeningM", slotOpeningM, 0.0, 0.1);
        c.throwIfAny();
        if (side == RotorSide.INNER) {
            double rotorIronDiameterM = gapDiameterM - 2.0 * airGapM - 2.0 * magnetThicknessM;
            if (rotorIronDiameterM <= 0.0) {
                throw new InfeasibleDesignException("magnetThicknessM", String.format(Locale.ROOT,
                        "magnetThicknessM = %s: an inner rotor with gapDiameterM = %s and airGapM = %s leaves a rotor "
                                + "iron diameter of %.4f m; it must be > 0", Checks.fmt(magnetThicknessM),
                        Checks.fmt(gapDiameterM), Checks.fmt(airGapM), rotorIronDiameterM));
            }
        }
    }

    /** Radius of the magnet surface facing the gap, metres. */
    public double magnetSurfaceRadiusM() {
        return side == RotorSide.INNER ? gapDiameterM / 2.0 - airGapM : gapDiameterM / 2.0 + airGapM;
    }

    /** Radius of the magnet face on the rotor iron, metres. */
    public double magnetBackRadiusM() {
        return side == RotorSide.INNER ? magnetSurfaceRadiusM() - magnetThicknessM
                : magnetSurfaceRadiusM() + magnetThicknessM;
    }

    /** Total magnet volume (all poles): pole-arc share of the magnet annulus times stack length, m^3. */
    public double magnetVolumeM3() {
        double a = magnetSurfaceRadiusM();
        double b = magnetBackRadiusM();
        return poleArcRatio * Math.PI * Math.abs(a * a - b * b) * stackLengthM;
    }

    /** A copy with another magnet thickness. */
    public RadialSurfaceRotor withMagnetThicknessM(double m) {
        return new RadialSurfaceRotor(side, gradeName, gapDiameterM, stackLengthM, airGapM, m, poleArcRatio,
                slotOpeningM);
    }

    /** A copy with another air gap. */
    public RadialSurfaceRotor withAirGapM(double m) {
        return new RadialSurfaceRotor(side, gradeName, gapDiameterM, stackLengthM, m, magnetThicknessM, poleArcRatio,
                slotOpeningM);
    }
}
