package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.machine.AirCoredStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.web.Json;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.junit.jupiter.api.Test;

class OldFieldNamesTest {
    private static ObjectNode object(String json) throws Exception {
        return (ObjectNode) Json.mapper().readTree(json);
    }

    @Test
    void the_rotor_names_are_renamed_with_their_values() throws Exception {
        ObjectNode rotor = object("{\"gradeName\":\"N42\",\"statorThicknessM\":0.018,\"runningClearanceM\":0.0015}");
        List<OldFieldNames.Rename> done = OldFieldNames.upgrade(AxialDualRotor.class, rotor);
        assertEquals(0.018, rotor.get("coilLayerThicknessM").doubleValue(), 0.0);
        assertEquals(0.0015, rotor.get("clearancePerSideM").doubleValue(), 0.0);
        assertFalse(rotor.has("statorThicknessM") || rotor.has("runningClearanceM"));
        assertEquals(List.of("statorThicknessM -> coilLayerThicknessM", "runningClearanceM -> clearancePerSideM"),
                done.stream().map(OldFieldNames.Rename::text).toList());
    }

    @Test
    void the_opening_end_widths_become_the_mid_width_and_the_taper() throws Exception {
        ObjectNode stator = object("{\"coilLegWidthM\":0.022,\"coilHoleInnerWidthM\":0.024,\"coilHoleOuterWidthM\":0.034}");
        OldFieldNames.upgrade(AirCoredStator.class, stator);
        // the old hole was 24 mm wide at its inner end and 34 mm at its outer end: 29 mm halfway, 10 mm of taper
        assertEquals(0.022, stator.get("conductorBandWidthM").doubleValue(), 0.0);
        assertEquals((0.024 + 0.034) / 2, stator.get("openingMidWidthM").doubleValue(), 0.0);
        assertEquals(0.034 - 0.024, stator.get("openingTaperM").doubleValue(), 0.0);
        AirCoredStator s = Json.mapper().treeToValue(stator.put("type", "AirCoredStator"), AirCoredStator.class);
        assertEquals(0.024, s.openingInnerEndWidthM(), 1e-16, "to rounding");
        assertEquals(0.034, s.openingOuterEndWidthM(), 1e-16, "to rounding");
    }

    @Test
    void an_object_already_using_the_new_name_keeps_its_old_one_for_the_binder_to_refuse() throws Exception {
        ObjectNode rotor = object("{\"statorThicknessM\":0.018,\"coilLayerThicknessM\":0.02}");
        assertTrue(OldFieldNames.upgrade(AxialDualRotor.class, rotor).isEmpty());
        assertTrue(rotor.has("statorThicknessM"));
        ObjectNode half = object("{\"coilLegWidthM\":0.02,\"coilHoleInnerWidthM\":0.024}");
        OldFieldNames.upgrade(AirCoredStator.class, half);
        assertTrue(half.has("coilHoleInnerWidthM"), "one end width alone cannot be converted");
        ObjectNode text = object("{\"coilHoleInnerWidthM\":\"wide\",\"coilHoleOuterWidthM\":0.03}");
        OldFieldNames.upgrade(AirCoredStator.class, text);
        assertTrue(text.has("coilHoleInnerWidthM") && !text.has("openingMidWidthM"));
    }

    @Test
    void a_whole_document_is_rewritten_by_the_type_names_with_dotted_paths() throws Exception {
        JsonNode doc = Json.mapper().readTree("{\"design\":{\"alternator\":{\"rotor\":{\"type\":\"AxialDualRotor\","
                + "\"statorThicknessM\":0.01},\"stator\":{\"type\":\"AirCoredStator\",\"coilLegWidthM\":0.02,"
                + "\"coilHoleInnerWidthM\":0.02,\"coilHoleOuterWidthM\":0.03}},\"others\":[{\"type\":\"AxialDualRotor\","
                + "\"runningClearanceM\":0.001},{\"type\":\"RadialSurfaceRotor\",\"statorThicknessM\":1}]}}");
        List<String> done = OldFieldNames.upgradeTree(doc).stream().map(OldFieldNames.Rename::text).toList();
        assertEquals(List.of("design.alternator.rotor.statorThicknessM -> design.alternator.rotor.coilLayerThicknessM",
                "design.alternator.stator.coilLegWidthM -> design.alternator.stator.conductorBandWidthM",
                "design.alternator.stator.coilHoleInnerWidthM+design.alternator.stator.coilHoleOuterWidthM -> "
                        + "design.alternator.stator.openingMidWidthM+design.alternator.stator.openingTaperM",
                "design.others[0].runningClearanceM -> design.others[0].clearancePerSideM"), done);
        assertEquals(1, doc.at("/design/others/1/statorThicknessM").intValue(), "only the renamed records change");
    }

    @Test
    void text_without_any_old_name_is_not_parsed_at_all() {
        assertFalse(OldFieldNames.mayHoldOldNames("{\"coilLayerThicknessM\":0.01}"));
        assertTrue(OldFieldNames.mayHoldOldNames("{\"runningClearanceM\":0.01}"));
    }
}
