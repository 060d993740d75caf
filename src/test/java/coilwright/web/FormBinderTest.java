package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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

    @Test
    void binds_dotted_form_fields_into_the_same_records_as_the_api() {
        FormResult<SampleDesign> r = forms.bind(FormBinder.single(validForm()), SampleDesign.class);
        assertTrue(r.valid(), r.errors().all().toString());
        SampleDesign d = r.record().orElseThrow();
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
        assertFalse(forms.bind(FormBinder.single(f), SampleDesign.class).record().orElseThrow().stator().airCored());
    }

    @Test
    void gives_the_api_messages_beside_each_field_and_keeps_what_was_typed() {
        Map<String, String> f = validForm();
        f.put("rotor.airGapM", "-1");
        f.put("rotor.poles", "eight");
        f.put("stator.coils[1].turns", "");
        f.put("rotor.magnet.thicknessM", "NaN");
        FormResult<SampleDesign> r = forms.bind(FormBinder.single(f), SampleDesign.class);
        assertFalse(r.valid());
        assertEquals("rotor.poles = \"eight\": must be a whole number", r.errors().first("rotor.poles"));
        assertEquals("rotor.magnet.thicknessM = \"NaN\": must be a finite number", r.errors().first("rotor.magnet.thicknessM"));
        assertEquals("stator.coils[1].turns is missing: a value is required", r.errors().first("stator.coils[1].turns"));
        assertFalse(r.errors().has("rotor.airGapM"), "own checks of rotor wait until its numbers are readable");
        assertEquals("eight", r.value("rotor.poles"));
        assertEquals("", r.value("no.such.field"));
    }

    @Test
    void a_range_error_from_a_compact_constructor_lands_on_its_field() {
        Map<String, String> f = validForm();
        f.put("rotor.airGapM", "0");
        FormResult<SampleDesign> r = forms.bind(FormBinder.single(f), SampleDesign.class);
        assertEquals("rotor.airGapM = 0.0: must be > 0", r.errors().first("rotor.airGapM"));
        assertEquals(List.of("rotor.airGapM = 0.0: must be > 0"), r.errors().all());
    }

    @Test
    void an_infeasible_design_is_shown_beside_its_field() {
        Map<String, String> f = validForm();
        f.put("stator.slots", "10");
        FormResult<SampleDesign> r = forms.bind(FormBinder.single(f), SampleDesign.class);
        assertTrue(r.errors().first("stator.slots").contains("cannot carry a balanced"));
    }

    @Test
    void converts_imperial_entries_to_SI_at_the_edge() {
        Map<String, String> f = validForm();
        f.put("rotor.magnet.thicknessM", "0.03");
        FormResult<SampleDesign> r = forms.bind(FormBinder.single(f), SampleDesign.class, Units.IMPERIAL,
                Map.of("rotor.magnet.thicknessM", Quantity.LENGTH));
        assertEquals(0.03 * 0.3048, r.record().orElseThrow().rotor().magnet().thicknessM(), 1e-15);
    }

    @Test
    void a_thousands_comma_is_not_read_as_a_decimal_point() {
        Map<String, String> f = validForm();
        f.put("stator.slots", "1,000");
        assertTrue(forms.bind(FormBinder.single(f), SampleDesign.class).errors().has("stator.slots"));
    }

    @Test
    void flattens_a_record_into_form_values_that_bind_back_to_it() {
        SampleDesign d = forms.bind(FormBinder.single(validForm()), SampleDesign.class).record().orElseThrow();
        Map<String, String> flat = FormBinder.flatten(d);
        assertEquals("0.002", flat.get("rotor.airGapM"));
        assertEquals("41", flat.get("stator.coils[1].turns"));
        assertEquals(d, forms.bind(FormBinder.single(flat), SampleDesign.class).record().orElseThrow());
    }
}
