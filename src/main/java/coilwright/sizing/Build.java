package coilwright.sizing;

import java.util.List;

/**
 * What can be built: the topology with its size limits, and the magnets the builder can get.
 * {@link AxialBuild}: dual-rotor axial-flux machine with air-cored coils; {@link RadialBuild}: surface magnets
 * facing a slotted stator the builder already has (inner or outer rotor).
 */
public sealed interface Build permits AxialBuild, RadialBuild {

    /** The magnet blocks the builder can get, at least one. */
    List<MagnetOption> magnets();

    /** Fewest poles to consider, even, 2 to 400. */
    int minPoles();

    /** Most poles to consider, even, minPoles to 400. */
    int maxPoles();

    /** Working magnet temperature, C. */
    double magnetTempC();
}
