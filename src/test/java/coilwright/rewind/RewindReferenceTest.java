package coilwright.rewind;

import coilwright.conductor.WireSpec;
import coilwright.machine.Connection;
import coilwright.winding.Layers;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/** The planner's figures against published values. */
class RewindReferenceTest {

    static ExistingMachine fourPole(Measurements m) {
        return new ExistingMachine(36, 0, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 20, WireSpec.awg(16, 2), null, m);
    }

    @Test
    @DisplayName("Synchronous speeds: 4 poles at 1500 rpm on 50 Hz, 6 poles at 1200 rpm on 60 Hz (n = 120 f / 2p; IEC 60034-1 / NEMA MG 1 synchronous speed tables)")
    void pole_counts_follow_the_synchronous_speed_relation() {
        assertEquals(4, fourPole(Measurements.of(400, 1500, 50, 0, 20)).polesUsed());
        assertEquals(6, new ExistingMachine(36, 0, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 20,
                WireSpec.awg(16, 2), null, Measurements.of(400, 1200, 60, 0, 20)).polesUsed());
    }

    @Test
    @DisplayName("IEC 60028: R75/R20 = 1.2162 for annealed copper")
    void resistance_measured_warm_is_referred_to_twenty_degrees_by_iec_60028() {
        ExistingMachine m = fourPole(Measurements.of(400, 1500, 50, 2 * 1.2162, 75));
        MachineCharacterisation ch = MachineCharacteriser.characterise(m);
        assertEquals(1.2162, ch.phaseResistanceOhm().orElseThrow().value(), 1e-12);
        assertEquals(1.0, ch.phaseResistance20COhm().orElseThrow().value(), 1e-4);
    }

    @Test
    @DisplayName("Distributed q = 3 full-pitch winding: kw1 = 0.9598 (DESIGN.md check values; El-Refaie 2010 tables); "
            + "kw3 = sin(90 deg)/(3 sin(30 deg)) = 0.6667 (distribution factor, e.g. Say, Alternating Current Machines)")
    void winding_factors_of_a_distributed_winding_match_the_textbook() {
        MachineCharacterisation ch = MachineCharacteriser.characterise(fourPole(Measurements.of(400, 1500, 50, 0, 20)));
        assertEquals(0.9598, ch.fundamentalWindingFactor(), 5e-5);
        assertEquals(2.0 / 3.0, ch.thirdHarmonicWindingFactor(), 1e-9);
    }

    @Test
    @DisplayName("ASTM B258: AWG 14 = 1.628 mm; mean turn from R = rho L / A with rho20 = 1/58 Ohm mm^2/m (IEC 60028)")
    void mean_turn_from_resistance_uses_the_standard_wire_area_and_resistivity() {
        // hand calculation: 12 coils of 36 turns in 3 phases -> 144 turns per phase; a 0.25 m turn of 2.0816 mm^2
        // copper at 20 C: R_ph = 144 * 0.25 / 58 / 2.0816 = 0.29817 Ohm; star line-to-line 0.59634 Ohm
        double areaMm2 = Math.PI * 1.628 * 1.628 / 4;
        double rPh = 144 * 0.25 / 58.0 / areaMm2;
        ExistingMachine m = new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 36,
                WireSpec.awg(14, 2), null, Measurements.of(24, 300, 40, 2 * rPh, 20));
        double mlt = MachineCharacteriser.characterise(m).meanTurnLengthM().orElseThrow().value();
        assertEquals(0.25, mlt, 0.25 * 5e-4); // 1.628 mm is rounded to 4 digits in the table
    }

    @Test
    @DisplayName("Three-phase bridge: conduction starts when the peak line voltage sqrt(2) V_LL exceeds Vdc + 2 Vd "
            + "(Mohan, Undeland, Robbins, Power Electronics 2003, ch. 5: two diodes conduct at a time)")
    void cut_in_of_a_24_volt_bank_through_silicon_diodes() {
        // hand calculation: Ke_LL = 0.1 V/rpm, 24 V + 2 x 0.8 V = 25.6 V peak -> 25.6 / (1.41421 x 0.1) = 181.02 rpm
        assertEquals(181.02, CutInSpeed.speedRpm(0.1, 24, 0.8), 0.01);
        RewindPlan plan = RewindPlanner.plan(MeasuredMachines.existing(MeasuredMachines.axial(36), 16),
                RewindTarget.battery(24, 181.02, 400));
        List<Reconnection> r = plan.reconnections();
        assertTrue(r.stream().allMatch(x -> Math.abs(Math.sqrt(2) * x.keLineRmsVPerRpm() * x.achieved() - 25.6) < 1e-9));
    }
}
