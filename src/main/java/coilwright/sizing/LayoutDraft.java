package coilwright.sizing;

import coilwright.machine.StatorSpec;
import coilwright.magnet.RotorSpec;
import coilwright.winding.WindingSpec;

/** A geometry and winding proposed by an enumerator, before the full model has checked it. */
record LayoutDraft(RotorSpec rotor, StatorSpec stator, WindingSpec winding, String label) {
}
