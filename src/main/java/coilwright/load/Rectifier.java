package coilwright.load;

import coilwright.validation.Checks;

/**
 * A diode bridge modelled as ideal diodes each with a constant forward drop.
 *
 * @param type         THREE_PHASE_BRIDGE or SINGLE_PHASE_BRIDGE
 * @param diode        the diode family (documents where the default drop came from)
 * @param forwardDropV forward drop of one diode used by the model, 0 to 5 V
 */
public record Rectifier(BridgeType type, DiodeType diode, double forwardDropV) {
    public Rectifier {
        new Checks().present("type", type).present("diode", diode)
                .range("forwardDropV", forwardDropV, 0, 5).throwIfAny();
    }

    /** A bridge with the typical forward drop of its diode family. */
    public Rectifier(BridgeType type, DiodeType diode) {
        this(type, diode, diode == null ? Double.NaN : diode.typicalForwardDropV());
    }
}
