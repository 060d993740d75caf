package coilwright.web.pages;

import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The design form's fields that are shown in another unit than the core's SI field: each dotted field name
 * (the same path as in the API's JSON) with how it is shown. Fields not listed are shown as the core holds them
 * (counts, rpm, volts, ohms, ratios).
 */
final class DesignFields {
    static final Map<String, Shown> SHOWN = build();

    private DesignFields() {
    }

    private static Map<String, Shown> build() {
        Map<String, Shown> m = new LinkedHashMap<>();
        for (String f : new String[] {"gapDiameterM", "stackLengthM", "airGapM", "magnetThicknessM", "slotOpeningM",
                "magnetWidthM", "magnetLengthM", "magnetCentreRadiusM", "coilLayerThicknessM", "clearancePerSideM"}) {
            m.put("alternator.rotor." + f, Shown.MM);
        }
        for (String f : new String[] {"slotDepthM", "slotWidthM", "toothTipHeightM", "slotLinerThicknessM",
                "endExtensionM", "conductorBandWidthM", "openingMidWidthM", "openingTaperM"}) {
            m.put("alternator.stator." + f, Shown.MM);
        }
        m.put("alternator.wire.bareDiameterM", Shown.MM);
        m.put("alternator.windingTempC", Shown.CELSIUS);
        m.put("alternator.magnetTempC", Shown.CELSIUS);
        m.put("alternator.ambientTempC", Shown.CELSIUS);
        m.put("alternator.phaseInductanceH", Shown.MILLIHENRY);
        for (String cable : new String[] {"load.acCable.", "load.dcCable."}) {
            m.put(cable + "lengthM", Shown.METRE);
            m.put(cable + "conductorAreaM2", Shown.MM2);
            m.put(cable + "temperatureC", Shown.CELSIUS);
        }
        return Map.copyOf(m);
    }

    /** The unit symbol shown beside a field, empty when the field has no conversion. */
    static String symbol(String field, coilwright.web.units.Units units) {
        Shown s = SHOWN.get(field);
        return s == null ? "" : s.symbol(units);
    }
}
