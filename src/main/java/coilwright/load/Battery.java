package coilwright.load;

import coilwright.validation.Checks;

/**
 * A battery bank seen by the charger as a constant voltage behind an optional internal resistance.
 *
 * @param chemistry             LEAD_ACID, LIFEPO4 or CUSTOM
 * @param cells                 cells in series, 1 to 400 (ignored for CUSTOM)
 * @param customVoltageV        bank voltage for CUSTOM, > 0 and <= 2000 V; 0 to 2000 V otherwise (ignored)
 * @param stage                 NOMINAL, ABSORB or FLOAT (ignored for CUSTOM)
 * @param internalResistanceOhm whole-bank internal resistance, 0 to 100 Ohm (added to the DC-side resistance)
 */
public record Battery(Chemistry chemistry, int cells, double customVoltageV, ChargeStage stage,
                      double internalResistanceOhm) {
    public Battery {
        Checks c = new Checks();
        c.present("chemistry", chemistry).present("stage", stage).intRange("cells", cells, 1, 400);
        if (chemistry == Chemistry.CUSTOM) {
            c.rangeExclusiveMin("customVoltageV", customVoltageV, 0, 2000);
        } else {
            c.range("customVoltageV", customVoltageV, 0, 2000);
        }
        c.range("internalResistanceOhm", internalResistanceOhm, 0, 100).throwIfAny();
    }

    /** A bank of {@code cells} cells of a chemistry at a charge stage, no internal resistance. */
    public static Battery of(Chemistry chemistry, int cells, ChargeStage stage) {
        return new Battery(chemistry, cells, 0, stage, 0);
    }

    /** A bank stated by its voltage only. */
    public static Battery custom(double voltageV) {
        return new Battery(Chemistry.CUSTOM, 1, voltageV, ChargeStage.NOMINAL, 0);
    }

    /** The bank voltage the rectifier works against, V. */
    public double voltageV() {
        return chemistry == Chemistry.CUSTOM ? customVoltageV
                : cells * BatteryChemistries.of(chemistry).cellV(stage);
    }

    /** The same bank with another internal resistance. */
    public Battery withInternalResistanceOhm(double ohm) {
        return new Battery(chemistry, cells, customVoltageV, stage, ohm);
    }
}
