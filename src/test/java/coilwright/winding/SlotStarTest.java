package coilwright.winding;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class SlotStarTest {

    @Test
    void slot_angles_are_exact_multiples_of_pi_over_q() {
        SlotStar star = new SlotStar(12, 5);
        // alpha = 150 degrees = 10 units of pi/12; slot 3 (0-based) at 450 = 90 degrees = 6 units
        assertEquals(10, star.angleUnits(1, 1));
        assertEquals(6, star.angleUnits(3, 1));
        assertEquals(Math.floorMod(7L * 3 * 10, 24), star.angleUnits(3, 7));
    }

    @Test
    void three_phase_sectors_run_a_plus_c_minus_b_plus_a_minus_c_plus_b_minus() {
        String[] names = new String[6];
        for (int s = 0; s < 6; s++) {
            names[s] = (SlotStar.polarityOf(s, 3) < 0 ? "-" : "+") + Winding.phaseName(SlotStar.phaseOf(s, 3));
        }
        assertArrayEquals(new String[] {"+A", "-C", "+B", "-A", "+C", "-B"}, names);
        assertEquals(2 * Math.PI / 3, SlotStar.phaseSpacingRad(3), 1e-15);
    }

    @Test
    void two_phase_sectors_put_the_phases_90_degrees_apart() {
        assertEquals(1, SlotStar.phaseOf(1, 2));
        assertEquals(-1, SlotStar.polarityOf(2, 2));
        assertEquals(Math.PI / 2, SlotStar.phaseSpacingRad(2), 1e-15);
    }

    @Test
    void sector_boundaries_avoid_phasors_and_the_first_phasor_is_in_sector_zero() {
        // six phasors 60 degrees apart (units of pi/6 with Q = 6): each sector of a 3-phase star holds one
        int[] sectors = SlotStar.sectors(new int[] {0, 2, 4, 6, 8, 10}, 6, 3);
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5}, sectors);
    }

    @Test
    void a_phase_group_does_not_wrap_round_from_the_last_coil_to_the_first() {
        // 9 slots / 10 poles: the first coil starts the group A -A A
        int[] units = new int[9];
        SlotStar star = new SlotStar(9, 5);
        for (int k = 0; k < 9; k++) {
            units[k] = star.angleUnits(k, 1);
        }
        int[] s = SlotStar.sectors(units, 9, 3);
        assertNotEquals(SlotStar.phaseOf(s[0], 3), SlotStar.phaseOf(s[8], 3));
        assertEquals(0, SlotStar.phaseOf(s[1], 3));
        assertEquals(0, SlotStar.phaseOf(s[2], 3));
    }
}
