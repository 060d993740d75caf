package coilwright.web.match;

import coilwright.conductor.ThermalClass;
import coilwright.system.HydroMatchResult;
import coilwright.system.LossPoint;
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

    static List<Figure> wind(WindMatchResult r, Fmt fmt, double ambientC) {
        var energy = r.annualEnergy();
        return List.of(
                Figure.of("air-density", "Air density", f("%.3f kg/m³", r.airDensityKgM3()), r.airDensitySource()),
                Figure.of("cut-in", "Charging starts at", r.cutInWindSpeedMs().isPresent()
                        ? fmt.shown(Shown.METRE_PER_SECOND, r.cutInWindSpeedMs().getAsDouble(), 3) : "never",
                        "once turning; the alternator's running drag (bearings, windage, iron, eddy currents) counted"),
                Figure.of("charges-from-rest", "On a rising wind from rest, charging starts at",
                        r.starting().chargesFromRestAtMs() > 0
                                ? fmt.shown(Shown.METRE_PER_SECOND, r.starting().chargesFromRestAtMs(), 3) : "never",
                        "the rotor must first break away, then reach cut-in"),
                Figure.of("starts-turning", "Starts turning from rest at",
                        fmt.shown(Shown.METRE_PER_SECOND, r.starting().startsTurningAtMs(), 3),
                        f("against %.2f N·m of cogging and bearing friction", r.starting().coggingPeakNm()
                                + r.starting().breakawayFrictionNm())),
                Figure.of("annual-energy", "Annual energy to the battery", f("%.0f kWh", energy.annualEnergyKWh()),
                        f("%.2f kWh a day", energy.dailyEnergyKWh())),
                Figure.of("peak-winding", "Winding at the top of the matched curve", fmt.temp(r.peakHeat().windingMeanC()),
                        "hot spot " + fmt.temp(r.peakHeat().windingHotSpotC()) + f(" at %.0f rpm, still air at ",
                                r.peakHeat().speedRpm()) + fmt.temp(ambientC)),
                Figure.of("delivered-energy", "After availability", f("%.0f kWh", r.deliveredAnnualEnergyKWh()),
                        f("available %.0f %% of the year", 100 * r.energyAssumptions().availability())),
                Figure.of("capacity-factor", "Capacity factor", f("%.1f %%", 100 * energy.capacityFactor()),
                        f("of %.0f W", energy.ratedPowerW())),
                Figure.of("matching", "Matching", f("%.0f %%", r.matchingPercent()),
                        f("of the battery energy with an ideal rotor (rotor capture %.0f %%)", r.rotorCapturePercent())),
                Figure.of("wind-class", "Small wind class", r.windClass().note(), "IEC 61400-2, for context"));
    }

    static List<Figure> hydro(HydroMatchResult r, Fmt fmt, ThermalClass insulation, double ambientC) {
        var p = r.penstock();
        LossPoint h = r.heat();
        boolean hot = h.windingHotSpotC() > insulation.limitC();
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
                        ? "from the flow-duration curve" : "give a flow-duration curve"),
                new Figure("hydro-winding", "Winding at the matched speed", (h.temperatureSettled() ? "" : "> ")
                        + fmt.temp(h.windingMeanC()), "hot spot " + fmt.temp(h.windingHotSpotC()) + ", insulation class "
                        + insulation.name() + " limit " + fmt.temp(insulation.limitC()) + ", still air at "
                        + fmt.temp(ambientC), hot ? "bad" : "ok"),
                Figure.of("hydro-losses", "Alternator losses at the matched speed", f("%.0f W", h.totalLossW()
                        - h.diodeLossW() - h.cableLossW() - h.batteryInternalLossW()), f("copper %.0f W, iron %.0f W, "
                        + "eddy %.0f W, delta %.0f W, bearings and windage %.0f W; efficiency every loss counted %.0f %%",
                        h.windingCopperLossW(), h.statorIronLossW(), h.conductorEddyLossW(), h.deltaCirculationLossW(),
                        h.bearingFrictionLossW() + h.windageLossW(), 100 * h.efficiency())));
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
