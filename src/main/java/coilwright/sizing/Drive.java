package coilwright.sizing;

/**
 * What turns the alternator: a wind rotor on its site, a hydro runner on its stream, or plain speed targets.
 */
public sealed interface Drive permits WindDrive, HydroDrive, SpeedTargets {
}
