package coilwright.web.match;

import coilwright.system.HydroMatchResult;
import coilwright.system.WindMatchResult;
import coilwright.web.Figure;
import coilwright.web.Words;
import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import java.util.List;
import java.util.Locale;

/** The figures of a match result an installer reads first, for the shared summary block. */
final class MatchSummary {
    private MatchSummary() {
    }

    static List<Figure> wind(WindMatchResult r, Fmt fmt) {
        var energy = r.annualEnergy();
        return List.of(
                Figure.of("air-density", "Air density", f("%.3f kg/m³", r.airDensityKgM3()), r.airDensitySource()),
                Figure.of("cut-in", "Charging starts at", r.cutInWindSpeedMs().isPresent()
                        ? fmt.shown(Shown.METRE_PER_SECOND, r.cutInWindSpeedMs().getAsDouble(), 3) : "never", "wind speed"),
                Figure.of("starts-turning", "Starts turning from rest at",
                        fmt.shown(Shown.METRE_PER_SECOND, r.starting().startsTurningAtMs(), 3),
                        f("against %.2f N·m of cogging and bearing friction", r.starting().coggingPeakNm()
                                + r.starting().breakawayFrictionNm())),
                Figure.of("annual-energy", "Annual energy to the battery", f("%.0f kWh", energy.annualEnergyKWh()),
                        f("%.2f kWh a day", energy.dailyEnergyKWh())),
                Figure.of("peak-winding", "Winding at the top of the matched curve",
                        fmt.temp(r.peakHeat().windingMeanC()), "hot spot " + fmt.temp(r.peakHeat().windingHotSpotC())
                                + f(" at %.0f rpm, still air at ", r.peakHeat().speedRpm()) + fmt.temp(25)),
                Figure.of("delivered-energy", "After availability", f("%.0f kWh", r.deliveredAnnualEnergyKWh()),
                        f("available %.0f %% of the year", 100 * r.energyAssumptions().availability())),
                Figure.of("capacity-factor", "Capacity factor", f("%.1f %%", 100 * energy.capacityFactor()),
                        f("of %.0f W", energy.ratedPowerW())),
                Figure.of("matching", "Matching", f("%.0f %%", r.matchingPercent()),
                        f("of the battery energy with an ideal rotor (rotor capture %.0f %%)", r.rotorCapturePercent())),
                Figure.of("wind-class", "Small wind class", r.windClass().note(), "IEC 61400-2, for context"));
    }

    static List<Figure> hydro(HydroMatchResult r, Fmt fmt) {
        var p = r.penstock();
        return List.of(
                Figure.of("net-head", "Net head", fmt.shown(Shown.METRE, p.netHeadM(), 3), f("penstock efficiency %.1f %%; "
                        + "Hazen-Williams friction ", 100 * p.penstockEfficiency()) + fmt.shown(Shown.METRE,
                        p.hazenWilliamsFrictionLossM(), 3) + " against Darcy-Weisbach " + fmt.shown(Shown.METRE,
                        p.frictionLossM(), 3)),
                Figure.of("runner", "Runner", Words.of(r.runnerKind()) + ", " + fmt.shown(Shown.MM, r.runnerDiameterM(), 3),
                        f("best speed %.0f rpm", r.optimumRunnerSpeedRpm())),
                Figure.of("power", "Hydraulic / peak shaft power", f("%.0f W / %.0f W", r.hydraulicPowerW(),
                        r.peakShaftPowerW()), ""),
                Figure.of("matched-speed", "Matched speed", f("%.0f rpm", r.matched().runnerSpeedRpm()),
                        f("%.0f %% of best", 100 * r.matched().speedShareOfOptimum())),
                Figure.of("battery-power", "Power to the battery", f("%.0f W", r.matched().powerToBatteryW()),
                        f("%.1f kWh a day", r.dailyEnergyKWh())),
                Figure.of("annual-energy", "Annual energy", r.annualEnergyKWh().isPresent()
                        ? f("%.0f kWh", r.annualEnergyKWh().getAsDouble()) : "—", r.annualEnergyKWh().isPresent()
                        ? "from the flow-duration curve" : "give a flow-duration curve"));
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
