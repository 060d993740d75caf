package coilwright.demag;

import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.CarterCoefficient;
import coilwright.magnet.MagnetGrade;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.validation.Checks;

/**
 * The magnet and gap geometry seen by one magnet, in the 2-D model of {@link coilwright.magnet.HarmonicGapField}:
 * a magnet of thickness l_m on iron, facing iron (radial, Carter-scaled gap) or the symmetry plane of a dual rotor
 * (axial, half the magnetic gap) at distance {@code gapToFacingM}.
 *
 * @param grade            magnet grade
 * @param magnetThicknessM l_m, m
 * @param gapToFacingM     magnet face to facing iron or symmetry plane, m
 * @param polePitchM       pole pitch, m
 * @param poleArcRatio     magnet width / pole pitch, 0.3 to 1
 * @param magnetsPerPole   magnets the armature MMF of one pole acts across: 1 radial, 2 axial dual rotor
 */
public record MagnetCircuit(MagnetGrade grade, double magnetThicknessM, double gapToFacingM, double polePitchM,
                            double poleArcRatio, int magnetsPerPole) {
    public MagnetCircuit {
        new Checks().present("grade", grade).positive("magnetThicknessM", magnetThicknessM)
                .positive("gapToFacingM", gapToFacingM).positive("polePitchM", polePitchM)
                .range("poleArcRatio", poleArcRatio, 0.05, 1).intRange("magnetsPerPole", magnetsPerPole, 1, 2)
                .throwIfAny();
    }

    /** A radial rotor over a slotted stator: Carter-scaled gap, pole pitch at the gap diameter. */
    public static MagnetCircuit radial(RadialSurfaceRotor rotor, int slots, int poles) {
        double slotPitch = Math.PI * rotor.gapDiameterM() / slots;
        double kc = CarterCoefficient.of(slotPitch, rotor.slotOpeningM(), rotor.airGapM());
        return new MagnetCircuit(rotor.grade(), rotor.magnetThicknessM(), kc * rotor.airGapM(),
                Math.PI * rotor.gapDiameterM() / poles, rotor.poleArcRatio(), 1);
    }

    /**
     * An axial dual rotor, taken at the magnets' inner radius, where the pole pitch is smallest, the magnets cover
     * most of it and the field between neighbours is strongest.
     */
    public static MagnetCircuit axial(AxialDualRotor rotor, int poles) {
        double tau = AxialDualRotor.polePitchAtM(rotor.innerRadiusM(), poles);
        return new MagnetCircuit(rotor.grade(), rotor.magnetThicknessM(), rotor.magneticGapM() / 2, tau,
                Math.min(1.0, rotor.magnetWidthM() / tau), 2);
    }
}
