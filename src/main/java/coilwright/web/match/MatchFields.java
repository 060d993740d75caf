package coilwright.web.match;

import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import coilwright.web.units.ShownFields;
import coilwright.web.units.Units;
import java.util.Map;

/**
 * The match pages' fields shown in the trade's units: rotor, site and pipe lengths in m (ft), wind in m/s (mph),
 * the stream in L/s (US gpm), pipe bore, roughness and runner in mm (in), temperatures in °C (°F). The field names
 * stay the API's SI paths; only what is typed and shown changes.
 */
public final class MatchFields {
    /** Both pages' fields (their names do not overlap). */
    static final ShownFields SHOWN = new ShownFields(Map.ofEntries(
            Map.entry("rotor.diameterM", Shown.METRE),
            Map.entry("site.altitudeM", Shown.METRE),
            Map.entry("site.temperatureC", Shown.CELSIUS),
            Map.entry("wind.meanWindSpeedMs", Shown.METRE_PER_SECOND),
            Map.entry("site.grossHeadM", Shown.METRE),
            Map.entry("site.designFlowM3s", Shown.LITRE_PER_SECOND),
            Map.entry("site.flowDuration[].flowM3s", Shown.LITRE_PER_SECOND),
            Map.entry("penstock.lengthM", Shown.METRE),
            Map.entry("penstock.innerDiameterM", Shown.MM),
            Map.entry("penstock.roughnessM", Shown.MM),
            Map.entry("runner.diameterM", Shown.MM),
            Map.entry("waterTempC", Shown.CELSIUS)));

    private MatchFields() {
    }

    /** The unit beside a match field, for templates: {@code ${matchUnit.of('site.grossHeadM')}}. */
    public record Symbols(Units units) {
        public String of(String field) {
            return SHOWN.symbol(field, units);
        }

        /** An SI value of a field as shown, to three significant figures, without its symbol. */
        public String show(String field, double si) {
            return Fmt.plain(SHOWN.of(field).fromSi(si, units), 3);
        }
    }
}
