package coilwright.web.rewind;

import coilwright.service.RewindRequest;
import com.fasterxml.jackson.databind.node.ObjectNode;
import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;
import coilwright.rewind.ExistingMachine;
import coilwright.rewind.Measurements;
import coilwright.rewind.RewindTarget;
import coilwright.web.Json;
import coilwright.winding.Layers;
import java.util.Optional;

/** Request bodies for the rewind tests: an invented 12-coil, 16-pole air-cored machine read at 300 rpm. */
public final class Bodies {
    static final double VOLTS = 41.5;
    static final double RPM = 300;

    private Bodies() {
    }

    /** 12 coils, 16 poles, star, 60 turns of AWG 16; 41.5 V and 40 Hz at 300 rpm; 1.45 Ohm line to line at 20 C. */
    static ExistingMachine machine() {
        return new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 60, WireSpec.awg(16, 2),
                Optional.empty(), Measurements.of(VOLTS, RPM, 40, 1.45, 20));
    }

    /** Charge 24 V from 150 rpm, output estimated at 400 rpm. */
    static RewindTarget battery() {
        return RewindTarget.battery(24, 150, 400);
    }

    /** The request as a mutable JSON tree. */
    static ObjectNode request(ExistingMachine machine, RewindTarget target) {
        return Json.mapper().valueToTree(new RewindRequest(machine, target));
    }

    public static ObjectNode request() {
        return request(machine(), battery());
    }

    static ObjectNode measurements(ObjectNode request) {
        return (ObjectNode) request.get("machine").get("measurements");
    }
}
