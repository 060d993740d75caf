package coilwright.machine;

import coilwright.conductor.Copper;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireSpec;
import coilwright.magnet.AxialDualRotor;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AlternatorModelTest {

    static final double TIGHT = 1e-12;

    @Test
    void line_constant_is_root_three_times_phase_in_star_and_equal_in_delta() {
        Alternator star = AlternatorModel.build(SampleDesigns.axial24V());
        Alternator delta = AlternatorModel.build(SampleDesigns.axial24V().withConnection(Connection.DELTA));
        assertEquals(Math.sqrt(3) * star.kePhaseRmsVPerRpm(), star.keLineRmsVPerRpm(), TIGHT);
        assertEquals(delta.kePhaseRmsVPerRpm(), delta.keLineRmsVPerRpm(), TIGHT);
        assertEquals(star.keLineRmsVPerRpm() / Math.sqrt(3), delta.keLineRmsVPerRpm(), TIGHT);
    }

    @Test
    void ke_follows_the_emf_equation_from_flux_turns_and_winding_factor() {
        Alternator a = AlternatorModel.build(SampleDesigns.axial24V());
        // 12 coils / 3 phases = 4 coils of 36 turns in series
        assertEquals(144, a.seriesTurnsPerPhase());
        double expected = Math.sqrt(2) * Math.PI * (8 / 60.0) * 144 * a.winding().fundamentalTotalFactor() * a.gapField().fluxPerPoleWb();
        assertEquals(expected, a.kePhaseRmsVPerRpm(), expected * TIGHT);
        assertEquals(a.emfPhaseRmsV(300), 300 * a.kePhaseRmsVPerRpm(), TIGHT);
        assertEquals(40.0, a.frequencyHz(300), TIGHT);
    }

    @Test
    void torque_constant_is_phases_times_phase_constant_in_volt_seconds() {
        Alternator a = AlternatorModel.build(SampleDesigns.radial12V());
        assertEquals(a.kePhaseRmsVPerRpm() * 60 / (2 * Math.PI), a.kePhaseVsPerRad(), TIGHT);
        assertEquals(3 * a.kePhaseVsPerRad(), a.ktNmPerA(), TIGHT);
    }

    @Test
    void resistance_is_copper_length_over_area_at_the_working_temperature() {
        Alternator a = AlternatorModel.build(SampleDesigns.axial24V());
        WireSpec w = SampleDesigns.axial24V().wire();
        double lengthM = 144 * a.meanTurnLengthM();
        assertEquals(Copper.resistanceOhm(lengthM, w.conductorCopperAreaM2(), 60), a.phaseResistanceHotOhm(), 1e-9);
        assertEquals(Copper.resistanceOhm(lengthM, w.conductorCopperAreaM2(), 20), a.resistance().resistance20COhm(), 1e-9);
    }

    @Test
    void two_parallel_paths_halve_the_emf_and_quarter_the_resistance() {
        AlternatorSpec one = SampleDesigns.axial24V();
        AlternatorSpec two = one.withWinding(one.winding().withParallelPaths(2));
        Alternator a1 = AlternatorModel.build(one);
        Alternator a2 = AlternatorModel.build(two);
        assertEquals(a1.keLineRmsVPerRpm() / 2, a2.keLineRmsVPerRpm(), 1e-12);
        assertEquals(a1.phaseResistanceHotOhm() / 4, a2.phaseResistanceHotOhm(), 1e-12);
    }

    @Test
    void a_measured_constant_replaces_the_computed_one_and_says_so() {
        Alternator computed = AlternatorModel.build(SampleDesigns.axial24V());
        Alternator measured = AlternatorModel.build(SampleDesigns.axial24V().withMeasuredKeLineVPerRpm(0.2));
        assertTrue(measured.keMeasured());
        assertEquals(0.2, measured.keLineRmsVPerRpm(), TIGHT);
        assertEquals(0.2 / Math.sqrt(3), measured.kePhaseRmsVPerRpm(), TIGHT);
        assertEquals(computed.computedKePhaseRmsVPerRpm(), measured.computedKePhaseRmsVPerRpm(), TIGHT);
        assertTrue(measured.warnings().stream().anyMatch(s -> s.contains("Measured Ke")));
    }

    @Test
    void an_entered_inductance_replaces_the_estimate() {
        Alternator a = AlternatorModel.build(SampleDesigns.radial12V().withPhaseInductanceH(0.0025));
        assertEquals(0.0025, a.phaseInductanceH(), TIGHT);
        assertEquals(AlternatorModel.ENTERED_INDUCTANCE_UNCERTAINTY, a.inductance().relativeUncertainty());
        Alternator est = AlternatorModel.build(SampleDesigns.radial12V());
        assertTrue(est.inductance().relativeUncertainty() > AlternatorModel.ENTERED_INDUCTANCE_UNCERTAINTY);
        assertTrue(est.phaseInductanceH() > 1e-5 && est.phaseInductanceH() < 0.1, "plausible mH range: " + est.phaseInductanceH());
    }

    @Test
    void tooth_coil_winding_reports_a_third_harmonic_that_the_phases_share() {
        Alternator a = AlternatorModel.build(SampleDesigns.axial24V());
        // 12 coils / 16 poles tooth coils: kw3 = 0 only for specific pitches; a ratio between 0 and 1 is reported
        double r3 = a.thirdHarmonicEmfRatio();
        assertTrue(r3 >= 0 && r3 < 1, "third harmonic ratio " + r3);
        assertEquals(6, a.emfHarmonics().size());
    }

    @Test
    void a_hot_winding_beyond_its_insulation_class_is_flagged() {
        AlternatorSpec s = SampleDesigns.radial12V();
        AlternatorSpec hot = new AlternatorSpec(s.winding(), s.turnsPerCoil(), s.connection(), s.rotor(), s.stator(), s.wire(),
                s.cooling(), ThermalClass.A, 120, s.magnetTempC(), 0, 0);
        Alternator a = AlternatorModel.build(hot);
        assertTrue(a.windingOverTemperature());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("insulation class A")));
    }

    @Test
    void refuses_an_unbalanced_winding_under_the_winding_field() {
        AlternatorSpec s = SampleDesigns.axial24V();
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> AlternatorModel.build(s.withWinding(new WindingSpec(12, 12, 3, Layers.DOUBLE, 0, 1, 0))));
        assertEquals("winding.slots", e.field());
    }

    @Test
    void refuses_wire_that_cannot_fit_its_window() {
        AlternatorSpec s = SampleDesigns.axial24V().withTurnsPerCoil(200);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> AlternatorModel.build(s));
        assertEquals("wire", e.field());
    }

    @Test
    void refuses_coils_that_do_not_fit_round_the_stator_ring() {
        AlternatorSpec s = SampleDesigns.axial24V();
        AlternatorSpec fat = new AlternatorSpec(s.winding(), s.turnsPerCoil(), s.connection(), s.rotor(),
                new AirCoredStator(0.030, 0.035, 0.010), s.wire(), s.cooling(), s.insulationClass(), 60, 40, 0, 0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> AlternatorModel.build(fat));
        assertEquals("stator.conductorBandWidthM", e.field());
        assertTrue(e.getMessage().contains("12 coils"), e.getMessage());
    }

    @Test
    void refuses_slots_that_leave_no_teeth() {
        AlternatorSpec s = SampleDesigns.radial12V();
        AlternatorSpec wide = new AlternatorSpec(s.winding(), s.turnsPerCoil(), s.connection(), s.rotor(),
                new SlottedStator(0.014, 0.009, 0.001, 0.0002, 0.005), s.wire(), s.cooling(), s.insulationClass(), 80, 50, 0, 0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> AlternatorModel.build(wide));
        assertEquals("stator.slotWidthM", e.field());
    }

    @Test
    void refuses_a_rotor_with_the_wrong_kind_of_stator() {
        AlternatorSpec s = SampleDesigns.axial24V();
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new AlternatorSpec(s.winding(), 36,
                Connection.STAR, s.rotor(), new SlottedStator(0.01, 0.004, 0.001, 0, 0), s.wire(), s.cooling(),
                s.insulationClass(), 60, 40, 0, 0));
        assertEquals("stator", e.errors().get(0).field());
    }

    @Test
    void refuses_delta_for_a_single_phase_winding_and_every_bad_number_at_once() {
        AlternatorSpec s = SampleDesigns.axial24V();
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new AlternatorSpec(
                new WindingSpec(12, 12, 1, Layers.DOUBLE, 0, 1, 0), 0, Connection.DELTA, s.rotor(), s.stator(), s.wire(),
                s.cooling(), s.insulationClass(), Double.NaN, 40, -1, 0));
        assertEquals(java.util.List.of("turnsPerCoil", "windingTempC", "measuredKeLineVPerRpm", "connection"),
                e.errors().stream().map(f -> f.field()).toList());
    }

    @Test
    void a_measured_ke_or_inductance_is_admitted_only_where_the_model_works() {
        AlternatorSpec s = SampleDesigns.axial24V();
        // 1e-200 H gave a 500 (an interval error in the pulse integration), 1e-12 H a NaN output power, and a Ke of
        // 1e-12 V/rpm an error about frequencyHz, a field nobody sent: all are now refused under their own names
        for (double l : new double[] {Double.MIN_VALUE, 1e-200, 1e-12, 9.9e-7}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> s.withPhaseInductanceH(l));
            assertEquals("phaseInductanceH", e.errors().get(0).field());
        }
        for (double ke : new double[] {1e-12, 9.9e-5}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> s.withMeasuredKeLineVPerRpm(ke));
            assertEquals("measuredKeLineVPerRpm", e.errors().get(0).field());
        }
        assertEquals(1e-6, AlternatorModel.build(s.withPhaseInductanceH(1e-6)).phaseInductanceH(), 0);
        assertTrue(AlternatorModel.build(s.withMeasuredKeLineVPerRpm(1e-4)).keLineRmsVPerRpm() > 0);
        assertEquals(0.0, s.withPhaseInductanceH(0).phaseInductanceH(), "0 still means estimate");
    }

    @Test
    void magnets_that_overlap_are_refused_under_the_rotor_field() {
        AlternatorSpec s = SampleDesigns.axial24V();
        AlternatorSpec crowded = new AlternatorSpec(s.winding().withPoles(32), 36, Connection.STAR,
                new AxialDualRotor("N42", 0.040, 0.050, 0.150, 0.010, 0.013, 0.0015), s.stator(), s.wire(), s.cooling(),
                s.insulationClass(), 60, 40, 0, 0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> AlternatorModel.build(crowded));
        assertEquals("rotor.magnetWidthM", e.field());
    }
}
