package coilwright.machine;

/** The stator that carries the winding: slotted iron (radial machines) or air-cored coils (axial dual-rotor machines). */
public sealed interface StatorSpec permits SlottedStator, AirCoredStator {
}
