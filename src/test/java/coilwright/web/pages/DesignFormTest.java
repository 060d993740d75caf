package coilwright.web.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.load.ResistiveLoad;
import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.system.EvaluationRequest;
import coilwright.validation.InvalidInputException;
import coilwright.web.FieldErrors;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class DesignFormTest {
    private final DesignForm forms = new DesignForm();

    private static Map<String, List<String>> posted(Map<String, String> values) {
        Map<String, List<String>> m = new HashMap<>();
        values.forEach((k, v) -> m.put(k, List.of(v)));
        return m;
    }

    private static Map<String, String> defaults(Units units) {
        return DesignDefaults.formValues(DesignDefaults.AXIAL_BATTERY, units);
    }

    @Test
    void the_default_form_binds_back_to_the_default_design() {
        assertEquals(DesignDefaults.AXIAL_BATTERY, forms.bind(posted(defaults(Units.SI)), Units.SI));
    }

    @Test
    void the_imperial_form_binds_back_to_the_same_design_within_display_rounding() {
        EvaluationRequest d = forms.bind(posted(defaults(Units.IMPERIAL)), Units.IMPERIAL);
        AxialDualRotor rotor = (AxialDualRotor) d.alternator().rotor();
        assertEquals(0.010, rotor.magnetThicknessM(), 1e-8);
        assertEquals(60.0, d.alternator().windingTempC(), 1e-4);
        assertEquals(20.0, d.load().acCable().lengthM(), 1e-4);
    }

    @Test
    void the_topology_choice_selects_the_rotor_side_and_the_load_choice_the_load() {
        Map<String, String> f = defaults(Units.SI);
        f.put("topology", "RADIAL_OUTER");
        f.put("loadType", "RESISTOR");
        f.put("alternator.turnsPerCoil", "20");
        f.put("alternator.wire.awg", "18");
        EvaluationRequest d = forms.bind(posted(f), Units.SI);
        RadialSurfaceRotor rotor = assertInstanceOf(RadialSurfaceRotor.class, d.alternator().rotor());
        assertEquals(RotorSide.OUTER, rotor.side());
        assertEquals(0.001, rotor.airGapM(), 1e-15, "1 mm entered");
        assertInstanceOf(ResistiveLoad.class, d.load());
    }

    @Test
    void unreadable_numbers_reach_the_binder_as_typed_and_are_named_there() {
        Map<String, String> f = defaults(Units.SI);
        f.put("alternator.rotor.magnetWidthM", "NaN");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> forms.bind(posted(f), Units.SI));
        assertEquals("alternator.rotor.magnetWidthM = \"NaN\": must be a finite number",
                FieldErrors.of(e).first("alternator.rotor.magnetWidthM"));
    }

    @Test
    void a_missing_load_choice_is_named_with_the_allowed_values() {
        Map<String, String> f = defaults(Units.SI);
        f.remove("loadType");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> forms.bind(posted(f), Units.SI));
        assertEquals("loadType = missing: must be one of BATTERY, RESISTOR", FieldErrors.of(e).first("loadType"));
    }
}
