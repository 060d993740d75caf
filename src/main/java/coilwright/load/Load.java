package coilwright.load;

/** What the alternator feeds: a battery through a diode bridge, or a star-connected resistor bank. */
public sealed interface Load permits BatteryLoad, ResistiveLoad {
    /** The cable between the alternator terminals and the load (per line). */
    Cable acCable();
}
