package coilwright.service;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireCatalogue;
import coilwright.conductor.WireSpec;
import coilwright.load.BatteryChemistries;
import coilwright.load.DiodeType;
import coilwright.magnet.MagnetGrade;
import coilwright.magnet.MagnetGrades;

import java.util.Arrays;
import java.util.List;

/**
 * The choices a design is made from, for forms and API clients.
 *
 * @param magnetGrades       magnet grades with remanence, temperature coefficient, coercivity and limits
 * @param awgSizes           round magnet wire by AWG (ASTM B258), insulation grade 2
 * @param metricSizes        round magnet wire by nominal diameter (IEC 60317 R20 series), grade 2
 * @param batteryChemistries per-cell voltages of the battery chemistries
 * @param cooling            current-density bands by cooling
 * @param insulationClasses  IEC 60085 thermal classes
 * @param diodes             rectifier diode types and their typical forward drop
 */
public record Catalogue(List<MagnetGrade> magnetGrades, List<WireOption> awgSizes, List<WireOption> metricSizes,
                        List<BatteryChemistries.CellVoltages> batteryChemistries, List<CoolingBand> cooling,
                        List<InsulationClass> insulationClasses, List<Diode> diodes) {

    /** One wire size. */
    public record WireOption(String label, String gauge, int awg, double bareDiameterM, double overallDiameterM,
                             double copperAreaM2) {
        static WireOption of(WireSpec w) {
            return new WireOption(w.label(), w.gauge().name(), w.awg(), w.bareDiameterM(), w.overallDiameterM(),
                    w.copperAreaM2());
        }
    }

    /** A cooling arrangement and its current-density band. */
    public record CoolingBand(String name, double lowAPerMm2, double highAPerMm2) {
    }

    /** An insulation thermal class and its temperature limit. */
    public record InsulationClass(String name, double limitC) {
    }

    /** A diode type and its typical forward drop. */
    public record Diode(String name, double forwardDropV) {
    }

    static Catalogue build() {
        return new Catalogue(MagnetGrades.all(),
                WireCatalogue.awgSizes().stream().map(WireOption::of).toList(),
                WireCatalogue.metricSizes().stream().map(WireOption::of).toList(),
                BatteryChemistries.all(),
                Arrays.stream(Cooling.values()).map(c -> new CoolingBand(c.name(), c.lowAPerMm2(), c.highAPerMm2())).toList(),
                Arrays.stream(ThermalClass.values()).map(t -> new InsulationClass(t.name(), t.limitC())).toList(),
                Arrays.stream(DiodeType.values()).map(d -> new Diode(d.name(), d.typicalForwardDropV())).toList());
    }
}
