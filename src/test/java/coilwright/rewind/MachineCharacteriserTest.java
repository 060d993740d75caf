package coilwright.rewind;

import coilwright.conductor.Copper;
import coilwright.machine.Alternator;
import coilwright.machine.Connection;
import coilwright.machine.EmfEquation;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class MachineCharacteriserTest {
    static final double HALF_PERCENT = 0.005;

    @Test
    void round_trip_recovers_poles_ke_flux_and_mean_turn_of_the_axial_sample() {
        Alternator a = MeasuredMachines.axial(36);
        MachineCharacterisation ch = MachineCharacteriser.characterise(MeasuredMachines.existing(a, 0));
        assertEquals(16, ch.poles());
        assertTrue(ch.polesInferred());
        assertEquals(4, ch.coilsPerPhase());
        assertEquals(144, ch.seriesTurnsPerPhase());
        assertEquals(a.keLineRmsVPerRpm(), ch.keLineRmsVPerRpm().value(), HALF_PERCENT * a.keLineRmsVPerRpm());
        assertEquals(a.kePhaseRmsVPerRpm(), ch.kePhaseRmsVPerRpm().value(), HALF_PERCENT * a.kePhaseRmsVPerRpm());
        double kwPhi = a.winding().fundamentalTotalFactor() * a.gapField().fluxPerPoleWb();
        assertEquals(kwPhi, ch.windingFactorTimesFluxWb().value(), HALF_PERCENT * kwPhi);
        double mlt = ch.meanTurnLengthM().orElseThrow().value();
        assertEquals(a.meanTurnLengthM(), mlt, HALF_PERCENT * a.meanTurnLengthM());
        assertEquals(a.resistance().resistance20COhm(), ch.phaseResistance20COhm().orElseThrow().value(),
                1e-9 * a.resistance().resistance20COhm());
    }

    @Test
    void round_trip_recovers_the_radial_sample_with_its_pole_count_given() {
        Alternator a = MeasuredMachines.radial(12);
        MachineCharacterisation ch = MachineCharacteriser.characterise(MeasuredMachines.existing(a, 12));
        assertEquals(12, ch.poles());
        assertFalse(ch.polesInferred());
        assertEquals(a.seriesTurnsPerPhase(), ch.seriesTurnsPerPhase());
        assertEquals(a.keLineRmsVPerRpm(), ch.keLineRmsVPerRpm().value(), HALF_PERCENT * a.keLineRmsVPerRpm());
        assertEquals(a.meanTurnLengthM(), ch.meanTurnLengthM().orElseThrow().value(),
                HALF_PERCENT * a.meanTurnLengthM());
        assertTrue(ch.derivedFrom().stream().anyMatch(s -> s.startsWith("pole count checked from 30.0 Hz at 300 rpm: 12 poles")),
                ch.derivedFrom().toString());
    }

    @Test
    void flux_product_reproduces_the_phase_emf_through_the_emf_equation() {
        Alternator a = MeasuredMachines.axial(30);
        MachineCharacterisation ch = MachineCharacteriser.characterise(MeasuredMachines.existing(a, 16));
        double e = EmfEquation.phaseRmsV(EmfEquation.frequencyHz(8, 250), ch.seriesTurnsPerPhase(), 1.0,
                ch.windingFactorTimesFluxWb().value());
        assertEquals(ch.kePhaseRmsVPerRpm().value() * 250, e, 1e-12 * e);
    }

    @Test
    void bands_follow_first_order_propagation_of_the_stated_accuracies() {
        Alternator a = MeasuredMachines.axial(36);
        Measurements m = new Measurements(a.emfLineRmsV(300), 300, 40, 2 * a.phaseResistanceHotOhm(), 60, 0, 3, 4, 0.5, 2.5);
        MachineCharacterisation ch = MachineCharacteriser.characterise(new ExistingMachine(12, 16, 3, Layers.DOUBLE,
                0, Connection.STAR, 4, 1, 36, a.spec().wire(), null, m));
        assertEquals(0.05, ch.keLineRmsVPerRpm().relativeUncertainty(), 1e-12);
        assertEquals(0.025, ch.meanTurnLengthM().orElseThrow().relativeUncertainty(), 1e-12);
        assertEquals(ch.keLineRmsVPerRpm().value() * 0.95, ch.keLineRmsVPerRpm().low(), 1e-15);
    }

    @Test
    void delta_line_resistance_is_converted_to_phase_resistance() {
        Alternator a = MeasuredMachines.axial(36);
        Measurements m = Measurements.of(a.emfLineRmsV(300) / Math.sqrt(3), 300, 40,
                a.phaseResistanceHotOhm() * 2.0 / 3.0, 60);
        MachineCharacterisation ch = MachineCharacteriser.characterise(new ExistingMachine(12, 16, 3, Layers.DOUBLE,
                0, Connection.DELTA, 0, 1, 36, a.spec().wire(), null, m));
        assertEquals(a.phaseResistanceHotOhm(), ch.phaseResistanceOhm().orElseThrow().value(), 1e-12);
        assertEquals(a.kePhaseRmsVPerRpm(), ch.kePhaseRmsVPerRpm().value(), 1e-12);
        assertEquals(a.meanTurnLengthM(), ch.meanTurnLengthM().orElseThrow().value(), 1e-9);
    }

    @Test
    void line_inductance_is_converted_to_phase_inductance_with_a_ten_percent_band() {
        Alternator a = MeasuredMachines.axial(36);
        ExistingMachine base = MeasuredMachines.existing(a, 16);
        ExistingMachine m = new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 36,
                a.spec().wire(), null, base.measurements().withLineInductanceH(2 * a.phaseInductanceH()));
        MachineCharacterisation ch = MachineCharacteriser.characterise(m);
        assertEquals(a.phaseInductanceH(), ch.phaseInductanceH().orElseThrow().value(), 1e-15);
        assertEquals(0.10, ch.phaseInductanceH().orElseThrow().relativeUncertainty(), 0);
        assertTrue(MachineCharacteriser.characterise(base).phaseInductanceH().isEmpty());
    }

    @Test
    void resistance_at_twenty_degrees_follows_iec_60028() {
        Alternator a = MeasuredMachines.axial(36);
        MachineCharacterisation ch = MachineCharacteriser.characterise(MeasuredMachines.existing(a, 16));
        assertEquals(ch.phaseResistanceOhm().orElseThrow().value() / Copper.resistanceRatio(60),
                ch.phaseResistance20COhm().orElseThrow().value(), 1e-15);
    }

    @Test
    void a_resistance_too_low_for_the_wire_and_turns_is_refused_naming_the_contradiction() {
        ExistingMachine m = withResistance(1e-6);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MachineCharacteriser.characterise(m));
        FieldError f = e.errors().get(0);
        assertEquals("measurements.lineResistanceOhm", f.field());
        assertTrue(f.message().contains("too low for 36 turns per coil of AWG 14, 1 path(s)"), f.message());
        assertTrue(f.message().contains("shorter than a circle round the wire itself"), f.message());
    }

    @Test
    void a_resistance_too_high_for_the_wire_and_turns_is_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> MachineCharacteriser.characterise(withResistance(50)));
        assertTrue(e.getMessage().contains("too high for 36 turns per coil of AWG 14"), e.getMessage());
        assertTrue(e.getMessage().contains("longer than 5.0 m"), e.getMessage());
    }

    @Test
    void a_small_but_possible_mean_turn_is_accepted_with_a_warning() {
        // MLT = R_ph A / (rho N C): pick R for a 20 mm turn
        double area = Math.PI * Math.pow(coilwright.conductor.WireSize.awgDiameterM(14), 2) / 4;
        double rPh = Copper.resistivityOhmM(20) * 144 * 0.020 / area;
        MachineCharacterisation ch = MachineCharacteriser.characterise(withResistance(2 * rPh));
        assertEquals(0.020, ch.meanTurnLengthM().orElseThrow().value(), 1e-12);
        assertTrue(ch.warnings().stream().anyMatch(w -> w.contains("only 20.0 mm")), ch.warnings().toString());
    }

    @Test
    void a_coil_count_that_does_not_match_the_layout_is_refused() {
        ExistingMachine m = new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 2, 1, 36,
                coilwright.conductor.WireSpec.awg(14, 2), null, Measurements.of(24, 300, 40, 0, 20));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MachineCharacteriser.characterise(m));
        assertEquals("coilsPerPhase", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("has 4 coils per phase"), e.getMessage());
    }

    @Test
    void missing_measurements_are_refused_and_missing_resistance_is_reported() {
        ExistingMachine none = new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 36,
                coilwright.conductor.WireSpec.awg(14, 2), null, null);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MachineCharacteriser.characterise(none));
        assertEquals("measurements", e.errors().get(0).field());
        MachineCharacterisation ch = MachineCharacteriser.characterise(withResistance(0));
        assertTrue(ch.meanTurnLengthM().isEmpty());
        assertTrue(ch.warnings().get(0).startsWith("no resistance measured"));
    }

    @Test
    void a_parallel_path_count_the_layout_does_not_allow_is_refused() {
        ExistingMachine m = new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 3, 36,
                coilwright.conductor.WireSpec.awg(14, 2), null, Measurements.of(24, 300, 40, 0, 20));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MachineCharacteriser.characterise(m));
        assertEquals("parallelPaths", e.errors().get(0).field());
    }

    private static ExistingMachine withResistance(double lineOhm) {
        return new ExistingMachine(12, 16, 3, Layers.DOUBLE, 0, Connection.STAR, 0, 1, 36,
                coilwright.conductor.WireSpec.awg(14, 2), null, Measurements.of(24, 300, 40, lineOhm, 20));
    }
}
