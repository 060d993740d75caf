package coilwright.load;

import coilwright.validation.Checks;

/**
 * A battery charged through a diode bridge, with cables on both sides of the bridge.
 *
 * @param battery   the bank
 * @param rectifier the bridge
 * @param acCable   alternator to rectifier (one conductor per line)
 * @param dcCable   rectifier to battery (a go-and-return pair)
 */
public record BatteryLoad(Battery battery, Rectifier rectifier, Cable acCable, Cable dcCable) implements Load {
    public BatteryLoad {
        new Checks().present("battery", battery).present("rectifier", rectifier)
                .present("acCable", acCable).present("dcCable", dcCable).throwIfAny();
    }
}
