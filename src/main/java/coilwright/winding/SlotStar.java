package coilwright.winding;

import org.apache.commons.math3.complex.Complex;

import java.util.TreeSet;

/**
 * The star of slots of Q slots and p pole pairs in exact integer arithmetic: the EMF phasor of slot k for
 * harmonic v sits at v*k*alpha, alpha = 2*pi*p/Q, stored as a whole number of units of pi/Q so that sector
 * boundaries and equal phasors are decided without rounding (Cros and Viarouge, 2002; Bianchi and Dai Pre,
 * 2006). Angles grow in the direction the EMF lags when the rotor moves towards higher slot numbers.
 */
final class SlotStar {
    private final int slots;
    private final int polePairs;

    SlotStar(int slots, int polePairs) {
        this.slots = slots;
        this.polePairs = polePairs;
    }

    int slots() {
        return slots;
    }

    /** Angle of 0-based slot {@code slot} for harmonic {@code order}, in units of pi/Q, 0..2Q-1. */
    int angleUnits(int slot, int order) {
        return (int) Math.floorMod((long) order * slot * 2L * polePairs, 2L * slots);
    }

    Complex slotPhasor(int slot, int order) {
        double a = Math.PI * angleUnits(slot, order) / slots;
        return new Complex(Math.cos(a), Math.sin(a));
    }

    /** EMF phasor of a coil for harmonic v: polarity * (go side - return side); magnitude up to 2. */
    Complex coilPhasor(int goSlot, int returnSlot, int polarity, int order) {
        Complex e = slotPhasor(goSlot, order).subtract(slotPhasor(returnSlot, order));
        return polarity > 0 ? e : e.negate();
    }

    /**
     * Sorts phasors (angles in units of pi/Q, listed in slot order) into the 2m sectors of width pi/m. The
     * sector boundaries go in the middle of a widest empty gap of the star folded onto one sector width, so no
     * phasor sits on a boundary. Of the equally wide gaps, the first is taken that makes the first phasor start
     * its phase group (the last phasor belongs to another phase), so a phase group does not wrap round the stator.
     * Sectors are numbered so that the first phasor lies in sector 0.
     *
     * @return sector 0..2m-1 of each phasor
     */
    static int[] sectors(int[] angleUnits, int slots, int phases) {
        // finer unit pi/(2Qm): a sector is 2Q units wide and a full turn 4Qm units
        long width = 2L * slots;
        TreeSet<Long> residues = new TreeSet<>();
        for (int n : angleUnits) {
            residues.add(Math.floorMod(2L * phases * n, width));
        }
        Long[] r = residues.toArray(new Long[0]);
        long bestGap = 0;
        for (int i = 0; i < r.length; i++) {
            bestGap = Math.max(bestGap, (i + 1 < r.length ? r[i + 1] : r[0] + width) - r[i]);
        }
        int[] fallback = null;
        for (int i = 0; i < r.length; i++) {
            long gap = (i + 1 < r.length ? r[i + 1] : r[0] + width) - r[i];
            if (gap == bestGap) {
                int[] sector = sectorsFor(angleUnits, slots, phases, r[i] + gap / 2);
                if (sector.length < 2 || phaseOf(sector[sector.length - 1], phases) != phaseOf(sector[0], phases)) {
                    return sector;
                }
                fallback = fallback == null ? sector : fallback;
            }
        }
        return fallback;
    }

    private static int[] sectorsFor(int[] angleUnits, int slots, int phases, long boundary) {
        long width = 2L * slots;
        long turn = 4L * slots * phases;
        int[] sector = new int[angleUnits.length];
        for (int i = 0; i < angleUnits.length; i++) {
            sector[i] = (int) (Math.floorMod(2L * phases * angleUnits[i] - boundary, turn) / width);
        }
        int first = sector.length == 0 ? 0 : sector[0];
        for (int i = 0; i < sector.length; i++) {
            sector[i] = Math.floorMod(sector[i] - first, 2 * phases);
        }
        return sector;
    }

    /**
     * Phase of a sector. Odd m: the sectors run A+, C-, B+, A-, C+, B- (three-phase), so phase axes are
     * 360/m degrees apart. Even m: A+, B+, ..., A-, B-, ..., axes 180/m degrees apart (two-phase at 90 degrees).
     */
    static int phaseOf(int sector, int phases) {
        if (phases % 2 == 0) {
            return sector % phases;
        }
        return sector % 2 == 0 ? sector / 2 : Math.floorMod(sector - phases, 2 * phases) / 2;
    }

    static int polarityOf(int sector, int phases) {
        if (phases % 2 == 0) {
            return sector < phases ? 1 : -1;
        }
        return sector % 2 == 0 ? 1 : -1;
    }

    /** Electrical angle between the axes of neighbouring phases, radians. */
    static double phaseSpacingRad(int phases) {
        return phases % 2 == 0 ? Math.PI / phases : 2 * Math.PI / phases;
    }
}
