package coilwright.web;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.units.Quantity;
import coilwright.web.units.Units;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class FormBinderTest {
    private final FormBinder forms = new FormBinder(new RecordBinder(Json.mapper()));

    private static Map<String, String> validForm() {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("name", "test rig");
        f.put("rotor.airGapM", "0.002");
        f.put("rotor.poles", "8");
        f.put("rotor.magnet.grade", "N42");
        f.put("rotor.magnet.thicknessM", "0.01");
        f.put("stator.slots", "12");
        f.put("stator.skewDeg", "");
        f.put("stator.coils[0].turns", "40");
        f.put("stator.coils[0].wireDiameterMm", "1.0");
        f.put("stator.coils[1].turns", "41");
        f.put("stator.coils[1].wireDiameterMm", "1.1");
        f.put("stator.airCored", "on");
        f.put("action", "Calculate");
        return f;
    }

    /** The messages by field of a refused form. */
    private FieldErrors refused(Map<String, String> f) {
        return FieldErrors.of(assertThrows(InvalidInputException.class,
                () -> forms.bind(FormBinder.single(f), SampleDesign.class)));
    }

    @Test
    void binds_dotted_form_fields_into_the_same_records_as_the_api() {
        SampleDesign d = forms.bind(FormBinder.single(validForm()), SampleDesign.class);
        assertEquals(0.002, d.rotor().airGapM(), 0.0);
        assertEquals(SampleDesign.Grade.N42, d.rotor().magnet().grade());
        assertEquals(List.of(40, 41), d.stator().coils().stream().map(SampleDesign.Coil::turns).toList());
        assertEquals(Optional.empty(), d.stator().skewDeg(), "a blank optional field is absent");
        assertTrue(d.stator().airCored(), "a checked checkbox is true");
    }

    @Test
    void an_unchecked_checkbox_is_false() {
        Map<String, String> f = validForm();
        f.remove("stator.airCored");
        assertFalse(forms.bind(FormBinder.single(f), SampleDesign.class).stator().airCored());
    }

    @Test
    void refuses_with_the_api_messages_for_each_field() {
        Map<String, String> f = validForm();
        f.put("rotor.airGapM", "-1");
        f.put("rotor.poles", "eight");
        f.put("stator.coils[1].turns", "");
        f.put("rotor.magnet.thicknessM", "NaN");
        FieldErrors errors = refused(f);
        assertEquals("rotor.poles = \"eight\": must be a whole number", errors.first("rotor.poles"));
        assertEquals("rotor.magnet.thicknessM = \"NaN\": must be a finite number", errors.first("rotor.magnet.thicknessM"));
        assertEquals("stator.coils[1].turns is missing: a value is required", errors.first("stator.coils[1].turns"));
        assertFalse(errors.has("rotor.airGapM"), "own checks of rotor wait until its numbers are readable");
    }

    @Test
    void a_range_error_from_a_compact_constructor_lands_on_its_field() {
        Map<String, String> f = validForm();
        f.put("rotor.airGapM", "0");
        FieldErrors errors = refused(f);
        assertEquals("rotor.airGapM = 0.0: must be > 0", errors.first("rotor.airGapM"));
        assertEquals(List.of("rotor.airGapM = 0.0: must be > 0"), errors.all());
    }

    @Test
    void an_infeasible_design_names_its_field() {
        Map<String, String> f = validForm();
        f.put("stator.slots", "10");
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> forms.bind(FormBinder.single(f), SampleDesign.class));
        assertEquals("stator.slots", e.field());
        assertTrue(e.getMessage().contains("cannot carry a balanced"), e.getMessage());
    }

    @Test
    void converts_imperial_entries_to_SI_at_the_edge() {
        Map<String, String> f = validForm();
        f.put("rotor.magnet.thicknessM", "0.03");
        SampleDesign d = forms.bind(FormBinder.single(f), SampleDesign.class, Units.IMPERIAL,
                Map.of("rotor.magnet.thicknessM", Quantity.LENGTH));
        assertEquals(0.03 * 0.3048, d.rotor().magnet().thicknessM(), 1e-15);
    }

    @Test
    void a_thousands_comma_is_not_read_as_a_decimal_point() {
        Map<String, String> f = validForm();
        f.put("stator.slots", "1,000");
        assertTrue(refused(f).has("stator.slots"));
    }

    @Test
    void flattens_a_record_into_form_values_that_bind_back_to_it() {
        SampleDesign d = forms.bind(FormBinder.single(validForm()), SampleDesign.class);
        Map<String, String> flat = FormBinder.flatten(d);
        assertEquals("0.002", flat.get("rotor.airGapM"));
        assertEquals("41", flat.get("stator.coils[1].turns"));
        assertEquals(d, forms.bind(FormBinder.single(flat), SampleDesign.class));
    }
}
