package coilwright.magnet;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.Locale;

/**
 * Axial-flux dual rotor: two steel discs carrying rectangular, axially magnetised magnets that face each other
 * N to S across an air-cored coil stator. All lengths in metres.
 *
 * @param gradeName            magnet grade, one of {@link MagnetGrades#names()}
 * @param magnetWidthM         tangential magnet width, 0.002 to 0.5 m
 * @param magnetLengthM        radial magnet length, 0.002 to 0.5 m
 * @param magnetCentreRadiusM  radius of the magnet centres (pitch circle), 0.01 to 3 m
 * @param magnetThicknessM     axial thickness of each magnet, 0.0005 to 0.1 m
 * @param coilLayerThicknessM  axial thickness of the air-cored coil layer between the discs, 0.001 to 0.1 m
 * @param clearancePerSideM    clearance between a magnet face and the coil layer, on each side, 0.0001 to 0.02 m
 */
public record AxialDualRotor(String gradeName, double magnetWidthM, double magnetLengthM, double magnetCentreRadiusM,
                             double magnetThicknessM, double coilLayerThicknessM, double clearancePerSideM)
        implements RotorSpec {

    public AxialDualRotor {
        Checks c = new Checks();
        MagnetGrades.checkName(c, "gradeName", gradeName);
        c.range("magnetWidthM", magnetWidthM, 0.002, 0.5);
        c.range("magnetLengthM", magnetLengthM, 0.002, 0.5);
        c.range("magnetCentreRadiusM", magnetCentreRadiusM, 0.01, 3.0);
        c.range("magnetThicknessM", magnetThicknessM, 0.0005, 0.1);
        c.range("coilLayerThicknessM", coilLayerThicknessM, 0.001, 0.1);
        c.range("clearancePerSideM", clearancePerSideM, 0.0001, 0.02);
        c.throwIfAny();
        double innerM = magnetCentreRadiusM - magnetLengthM / 2.0;
        if (innerM <= 0.0) {
            throw new InfeasibleDesignException("magnetLengthM", String.format(Locale.ROOT,
                    "magnetLengthM = %s: with magnetCentreRadiusM = %s the magnets' inner edge would be at radius "
                            + "%.4f m; it must be > 0 (magnetLengthM < 2 * magnetCentreRadiusM)",
                    Checks.fmt(magnetLengthM), Checks.fmt(magnetCentreRadiusM), innerM));
        }
    }

    /** Total magnetic gap between the two magnet faces: coil layer thickness + 2 * clearance per side, metres. */
    public double magneticGapM() {
        return coilLayerThicknessM + 2.0 * clearancePerSideM;
    }

    /** Radius of the magnets' inner edge, metres. */
    public double innerRadiusM() {
        return magnetCentreRadiusM - magnetLengthM / 2.0;
    }

    /** Radius of the magnets' outer edge, metres. */
    public double outerRadiusM() {
        return magnetCentreRadiusM + magnetLengthM / 2.0;
    }

    /** Pole pitch (arc length) at radius {@code radiusM} for {@code poles} poles, metres. */
    public static double polePitchAtM(double radiusM, int poles) {
        return 2.0 * Math.PI * radiusM / poles;
    }

    /**
     * Refuses a magnet layout that does not fit {@code poles} magnets per disc: the pole-arc ratio at the centre
     * radius must be at most 1, and the inner corners of neighbouring rectangular magnets must not touch, i.e.
     * magnetWidthM < 2 * r_inner * tan(pi / poles) (the chord between neighbouring centre lines at the inner edge).
     *
     * @throws InfeasibleDesignException naming {@code magnetWidthM} when the magnets overlap or touch
     */
    public void checkFits(int poles) {
        double tauCentreM = polePitchAtM(magnetCentreRadiusM, poles);
        if (magnetWidthM > tauCentreM) {
            throw new InfeasibleDesignException("magnetWidthM", String.format(Locale.ROOT,
                    "magnetWidthM = %s: wider than the pole pitch %.4f m at magnetCentreRadiusM = %s with %d poles "
                            + "(pole-arc ratio %.3f > 1): neighbouring magnets overlap", Checks.fmt(magnetWidthM),
                    tauCentreM, Checks.fmt(magnetCentreRadiusM), poles, magnetWidthM / tauCentreM));
        }
        double halfAngle = Math.PI / poles;
        double innerGapLimitM = halfAngle >= Math.PI / 2.0 ? Double.POSITIVE_INFINITY
                : 2.0 * innerRadiusM() * Math.tan(halfAngle);
        if (magnetWidthM >= innerGapLimitM) {
            throw new InfeasibleDesignException("magnetWidthM", String.format(Locale.ROOT,
                    "magnetWidthM = %s: neighbouring magnets touch at their inner edge (radius %.4f m) with %d poles; "
                            + "the width must be < %.4f m there (2 * inner radius * tan(pi / poles))",
                    Checks.fmt(magnetWidthM), innerRadiusM(), poles, innerGapLimitM));
        }
    }

    /** Total magnet volume of both discs for {@code poles} magnets per disc, m^3. */
    public double magnetVolumeM3(int poles) {
        return 2.0 * poles * magnetWidthM * magnetLengthM * magnetThicknessM;
    }

    /** A copy with another magnet thickness. */
    public AxialDualRotor withMagnetThicknessM(double m) {
        return new AxialDualRotor(gradeName, magnetWidthM, magnetLengthM, magnetCentreRadiusM, m, coilLayerThicknessM,
                clearancePerSideM);
    }

    /** A copy with another clearance per side. */
    public AxialDualRotor withClearancePerSideM(double m) {
        return new AxialDualRotor(gradeName, magnetWidthM, magnetLengthM, magnetCentreRadiusM, magnetThicknessM,
                coilLayerThicknessM, m);
    }
}
