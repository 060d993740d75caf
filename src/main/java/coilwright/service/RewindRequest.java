package coilwright.service;

import coilwright.rewind.ExistingMachine;
import coilwright.rewind.RewindTarget;
import coilwright.validation.Checks;

/**
 * Body of {@code POST /api/v1/rewind} and of the {@code /rewind} form: what is known and measured of the machine,
 * and what it should do.
 *
 * @param machine the existing machine with its measurements (coilWindow may be left out or null: unknown)
 * @param target  a battery cut-in or a line voltage at a speed, and where to estimate output
 */
public record RewindRequest(ExistingMachine machine, RewindTarget target) {
    public RewindRequest {
        new Checks().present("machine", machine).present("target", target).throwIfAny();
    }
}
