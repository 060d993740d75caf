package coilwright.losses;

import coilwright.validation.Checks;

/**
 * The iron of a slotted stator, beyond what {@link coilwright.machine.SlottedStator} holds for the winding.
 *
 * @param steelName       one of {@link ElectricalSteels#names()}, e.g. {@code "M400-50A"} or
 *                        {@link ElectricalSteels#UNKNOWN_MOTOR_LAMINATION}
 * @param yokeThicknessM  radial depth of the back iron behind the slots, m, 0.001 to 0.5
 * @param stackingFactor  iron share of the stack length, 0.85 to 1 (0.95 typical; common practice)
 * @param buildFactor     ratio of the loss in the finished core to the sheet's Epstein loss, 1 to 3: punching,
 *                        burrs, pressing and non-sinusoidal flux raise it; 1.5 by default (Pyrhonen, Jokinen &amp;
 *                        Hrabovcova, "Design of Rotating Electrical Machines", 2008, suggest about 1.5 to 2 for
 *                        small machines; from memory)
 */
public record StatorCore(String steelName, double yokeThicknessM, double stackingFactor, double buildFactor) {
    public static final double DEFAULT_STACKING_FACTOR = 0.95;
    public static final double DEFAULT_BUILD_FACTOR = 1.5;

    public StatorCore {
        Checks c = new Checks();
        c.require(ElectricalSteels.find(steelName).isPresent(), "steelName", steelName,
                "unknown electrical steel; allowed: " + String.join(", ", ElectricalSteels.names()),
                String.join(", ", ElectricalSteels.names()));
        c.range("yokeThicknessM", yokeThicknessM, 0.001, 0.5);
        c.range("stackingFactor", stackingFactor, 0.85, 1.0);
        c.range("buildFactor", buildFactor, 1.0, 3.0);
        c.throwIfAny();
    }

    /** A core of that steel and yoke with the default stacking and build factors. */
    public static StatorCore of(String steelName, double yokeThicknessM) {
        return new StatorCore(steelName, yokeThicknessM, DEFAULT_STACKING_FACTOR, DEFAULT_BUILD_FACTOR);
    }

    /** The steel grade. */
    public ElectricalSteel steel() {
        return ElectricalSteels.byName(steelName);
    }
}
