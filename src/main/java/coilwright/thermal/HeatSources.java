package coilwright.thermal;

import coilwright.validation.Checks;

/**
 * Where the losses of one operating point turn into heat, W. Windage heats the air that leaves, not the machine,
 * so it has no entry here.
 *
 * @param windingW    heat in the copper: I^2 R, conductor eddy loss and delta circulating-current loss, &gt;= 0
 * @param statorIronW stator iron loss, &gt;= 0 (0 for an air-cored stator)
 * @param rotorW      heat in magnets and rotor iron (eddy losses there), &gt;= 0
 * @param bearingW    bearing friction, which heats the housing (or the rotor hub of a disc machine), &gt;= 0
 */
public record HeatSources(double windingW, double statorIronW, double rotorW, double bearingW) {
    public HeatSources {
        new Checks().nonNegative("windingW", windingW).nonNegative("statorIronW", statorIronW)
                .nonNegative("rotorW", rotorW).nonNegative("bearingW", bearingW).throwIfAny();
    }

    /** Only copper-side heat. */
    public static HeatSources winding(double windingW) {
        return new HeatSources(windingW, 0, 0, 0);
    }

    /** Sum of every heat input, W. */
    public double totalW() {
        return windingW + statorIronW + rotorW + bearingW;
    }

    /** Every input scaled by a factor &gt;= 0. */
    public HeatSources scaled(double factor) {
        return new HeatSources(windingW * factor, statorIronW * factor, rotorW * factor, bearingW * factor);
    }
}
