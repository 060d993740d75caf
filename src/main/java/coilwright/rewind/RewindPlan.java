package coilwright.rewind;

import java.util.List;

/**
 * The planner's answer: the machine as measured, and ranked ways to meet the target.
 *
 * @param characterisation      what the measurements say about the machine
 * @param target                the target
 * @param wantedKeLineRmsVPerRpm line EMF per rpm (rms) that meets the target exactly, V/rpm
 * @param keRelativeUncertainty relative uncertainty carried by every predicted Ke, voltage and cut-in (from the
 *                              measured Ke)
 * @param reconnections         reconnections without rewinding, closest to the target first (the present
 *                              connection included, marked unchanged)
 * @param rewinds               rewinds, closest to the target first
 * @param notes                 how the figures were made
 */
public record RewindPlan(MachineCharacterisation characterisation, RewindTarget target, double wantedKeLineRmsVPerRpm,
                         double keRelativeUncertainty, List<Reconnection> reconnections, List<RewindOption> rewinds,
                         List<String> notes) {
    public RewindPlan {
        reconnections = List.copyOf(reconnections);
        rewinds = List.copyOf(rewinds);
        notes = List.copyOf(notes);
    }
}
