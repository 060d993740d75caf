package coilwright.magnet;

/**
 * A permanent-magnet rotor topology. All lengths in metres.
 * {@link RadialSurfaceRotor}: surface magnets facing a slotted iron stator across a radial gap;
 * {@link AxialDualRotor}: two magnet discs facing each other across an air-cored coil stator.
 */
public sealed interface RotorSpec permits RadialSurfaceRotor, AxialDualRotor {

    /** The magnet grade name, one of {@link MagnetGrades#names()}. */
    String gradeName();

    /** Magnet thickness along the magnetisation direction, metres. */
    double magnetThicknessM();

    /** The magnet grade. */
    default MagnetGrade grade() {
        return MagnetGrades.byName(gradeName());
    }
}
