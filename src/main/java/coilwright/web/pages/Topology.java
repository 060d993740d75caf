package coilwright.web.pages;

import coilwright.machine.AirCoredStator;
import coilwright.machine.SlottedStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import java.util.Map;

/** The rotor arrangements the design form offers, each with the rotor and stator records it binds to. */
enum Topology {
    RADIAL_INNER("Radial flux, inner rotor (slotted stator)", RadialSurfaceRotor.class, SlottedStator.class),
    RADIAL_OUTER("Radial flux, outer rotor (slotted stator)", RadialSurfaceRotor.class, SlottedStator.class),
    AXIAL_DUAL("Axial flux, dual rotor (air-cored coils)", AxialDualRotor.class, AirCoredStator.class);

    static final String FIELD = "topology";
    private final String label;
    private final Class<?> rotor;
    private final Class<?> stator;

    Topology(String label, Class<?> rotor, Class<?> stator) {
        this.label = label;
        this.rotor = rotor;
        this.stator = stator;
    }

    Class<?> rotor() {
        return rotor;
    }

    Class<?> stator() {
        return stator;
    }

    /** The side a radial rotor is on; empty for the axial machine. */
    String side() {
        return this == RADIAL_INNER ? RotorSide.INNER.name() : this == RADIAL_OUTER ? RotorSide.OUTER.name() : "";
    }

    /** The chosen topology, empty when the text names none. */
    static java.util.Optional<Topology> parse(String text) {
        return java.util.Arrays.stream(values()).filter(t -> t.name().equals(text)).findFirst();
    }

    /** From flattened design values ({@code alternator.rotor.type}, {@code alternator.rotor.side}). */
    static Topology of(Map<String, String> values) {
        if ("AxialDualRotor".equals(values.get("alternator.rotor.type"))) {
            return AXIAL_DUAL;
        }
        return "OUTER".equals(values.get("alternator.rotor.side")) ? RADIAL_OUTER : RADIAL_INNER;
    }

    /** Value to label, for the select. */
    static Map<String, String> choices() {
        Map<String, String> m = new java.util.LinkedHashMap<>();
        for (Topology t : values()) {
            m.put(t.name(), t.label);
        }
        return m;
    }
}
