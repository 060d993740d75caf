package coilwright.turbine;

/** No over-speed control: the rotor always faces the whole wind. */
public record NoFurling() implements FurlingControl {
    @Override
    public double effectiveWindSpeedMs(double windSpeedMs, WindRotor rotor, double airDensityKgM3) {
        return windSpeedMs;
    }
}
