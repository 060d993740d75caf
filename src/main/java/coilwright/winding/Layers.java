package coilwright.winding;

/** Number of coil sides per slot (or per air-cored coil position). */
public enum Layers {
    /** One coil side per slot: Q/2 coils; on a slotted stator every other tooth carries a coil. */
    SINGLE(1),
    /** Two coil sides per slot: Q coils, one starting in every slot. */
    DOUBLE(2);

    private final int sidesPerSlot;

    Layers(int sidesPerSlot) {
        this.sidesPerSlot = sidesPerSlot;
    }

    /** Coil sides in each slot: 1 or 2. */
    public int sidesPerSlot() {
        return sidesPerSlot;
    }

    /** Number of coils for {@code slots} slots: Q for double layer, Q/2 for single layer. */
    public int coilCount(int slots) {
        return slots * sidesPerSlot / 2;
    }
}
