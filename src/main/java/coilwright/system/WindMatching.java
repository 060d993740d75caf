package coilwright.system;

import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.safety.Caution;
import coilwright.turbine.AnnualEnergy;
import coilwright.turbine.AnnualEnergyResult;
import coilwright.turbine.EnergyAssumptions;
import coilwright.turbine.FurlingControl;
import coilwright.turbine.SmallWindClass;
import coilwright.turbine.WindDistribution;
import coilwright.turbine.WindRotor;
import coilwright.validation.InfeasibleDesignException;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.function.ToDoubleFunction;

/**
 * A whole wind system matched over the wind-speed table (0 to the top in 0.5 m/s steps), with the annual
 * energy by the bin method of IEC 61400-12-1 (clause 9.3; {@link AnnualEnergy}) and the cautions.
 *
 * <p>Matching percentage: 100 x (annual battery energy with the matched rotor) / (annual battery energy of the
 * ideal rotor), where the ideal battery power at a wind speed is the rotor's power at its optimum tip-speed ratio
 * (capped at the maximum speed) x drivetrain efficiency x the alternator's efficiency at the matched point (where
 * the matched rotor spins freely below cut-in: the alternator's efficiency at the ideal rotor's speed). It
 * isolates how well the alternator's torque curve loads the rotor, separately from the alternator's own losses;
 * it is at most 100 %. Both sums use the same distribution and bins. The rotor capture percentage compares the
 * rotor energies alone.
 */
public final class WindMatching {

    private WindMatching() {
    }

    /**
     * @throws coilwright.validation.InvalidInputException     when an input is out of range
     * @throws InfeasibleDesignException when the machine cannot be built, or never charges up to the top wind speed
     */
    public static WindMatchResult match(WindMatchRequest req) {
        return match(AlternatorModel.build(req.alternator()), req);
    }

    /** As {@link #match(WindMatchRequest)} with an already-built alternator. */
    public static WindMatchResult match(Alternator alt, WindMatchRequest req) {
        return match(alt, req, RunningDrag.of(alt, req.load()));
    }

    /**
     * As {@link #match(Alternator, WindMatchRequest)} with the electrical torque alone (no running drag): the design
     * search's full model, whose worked example and limits were set before the drag was counted.
     */
    public static WindMatchResult matchWithoutDrag(Alternator alt, WindMatchRequest req) {
        return match(alt, req, RunningDrag.none());
    }

    private static WindMatchResult match(Alternator alt, WindMatchRequest req, RunningDrag drag) {
        WindRotor rotor = req.rotor();
        double rho = req.site().effectiveAirDensityKgM3();
        AlternatorCurve curve = new AlternatorCurve(alt, req.load());
        WindMatcher matcher = new WindMatcher(curve, rotor, rho, req.maxWindSpeedMs(), drag);
        List<WindMatchPoint> points = new ArrayList<>();
        FurlingControl control = WindAssessment.control(req);
        for (double v : req.windSpeedsMs()) {
            points.add(WindAssessment.at(matcher, control, v));
        }
        double maxBatteryW = points.stream().mapToDouble(WindMatchPoint::powerToBatteryW).max().orElse(0);
        if (maxBatteryW <= 0) {
            throw new InfeasibleDesignException("alternator", String.format(Locale.ROOT,
                    "The alternator never delivers power up to %.1f m/s: the rotor reaches %.0f rpm at most (alternator "
                            + "%.0f rpm) and the alternator does not cut in there. Use more turns, a higher drive ratio "
                            + "or a larger rotor", req.maxWindSpeedMs(),
                    points.get(points.size() - 1).rotorSpeedRpm(), points.get(points.size() - 1).alternatorSpeedRpm()));
        }
        double maxDcA = points.stream().mapToDouble(WindMatchPoint::dcCurrentA).max().orElse(0);
        OptionalDouble cutIn = points.stream().filter(p -> p.powerToBatteryW() > 0)
                .mapToDouble(WindMatchPoint::windSpeedMs).findFirst();

        WindDistribution distribution = req.wind().distribution();
        AnnualEnergyResult energy = annual(points, WindMatchPoint::powerToBatteryW, distribution, req, maxBatteryW);
        double idealKWh = annual(points, WindMatchPoint::idealBatteryPowerW, distribution, req, maxBatteryW)
                .annualEnergyKWh();
        double rotorKWh = annual(points, WindMatchPoint::rotorPowerW, distribution, req, maxBatteryW).annualEnergyKWh();
        double idealRotorKWh = annual(points, WindMatchPoint::idealRotorPowerW, distribution, req, maxBatteryW)
                .annualEnergyKWh();

        boolean limited = rotor.maxRotorSpeedRpm() > 0;
        double checkRotorRpm = limited ? rotor.maxRotorSpeedRpm() : rotor.freeSpinSpeedRpm(req.maxWindSpeedMs());
        String source = limited ? "the rotor's maximum (furling or governor) speed"
                : String.format(Locale.ROOT, "the rotor's free-spinning speed at %.1f m/s, as no maximum speed was given",
                req.maxWindSpeedMs());
        double checkAltRpm = rotor.alternatorSpeedRpm(checkRotorRpm);
        List<Caution> cautions = new ArrayList<>(AlternatorEvaluator.cautionsAt(alt, req.load(), checkAltRpm, source,
                maxBatteryW, maxDcA));
        WindStart starting = WindAssessment.starting(alt, rotor, rho, cutIn, distribution);
        WindAssessment.startingCaution(starting).ifPresent(cautions::add);
        LossPoint peakHeat = WindAssessment.peakHeat(curve, points);
        WindAssessment.peakHeatCaution(alt, peakHeat).ifPresent(cautions::add);
        cautions.sort(java.util.Comparator.comparing(Caution::severity));
        EnergyAssumptions assumed = WindAssessment.energyAssumptions(req);

        double topRotorRpm = 1.2 * points.stream().mapToDouble(WindMatchPoint::rotorSpeedRpm).max().orElse(1.0);
        return new WindMatchResult(rho, req.site().densityEntered() ? "entered"
                : String.format(Locale.ROOT, "ISA pressure at %.0f m with %.1f C air", req.site().altitudeM(),
                req.site().temperatureC()),
                rotor.curve().optimumTipSpeedRatio(), rotor.curve().maxCp(),
                WindMatcher.STALL_TSR_SHARE * rotor.curve().optimumTipSpeedRatio(), points, cutIn, energy, idealKWh,
                idealKWh > 0 ? 100.0 * energy.annualEnergyKWh() / idealKWh : 0.0,
                idealRotorKWh > 0 ? 100.0 * rotorKWh / idealRotorKWh : 0.0,
                SmallWindClass.classFor(req.wind().meanWindSpeedMs()), checkAltRpm, source,
                curve.openCircuitLineRmsV(checkAltRpm), matcher.loadCurve(topRotorRpm), cautions,
                warnings(alt, points, energy), WindAssessment.describe(control), starting, assumed,
                assumed.deliveredKWh(energy.annualEnergyKWh()), peakHeat);
    }

    private static AnnualEnergyResult annual(List<WindMatchPoint> points, ToDoubleFunction<WindMatchPoint> power,
                                             WindDistribution distribution, WindMatchRequest req, double ratedW) {
        return AnnualEnergy.binMethod(v -> power.applyAsDouble(points.get(index(v, points.size()))), distribution,
                WindMatchRequest.WIND_STEP_MS, req.maxWindSpeedMs(), ratedW);
    }

    /** The table row of a bin-edge wind speed (the bins and the table share the 0.5 m/s step). */
    private static int index(double windSpeedMs, int rows) {
        return Math.min(rows - 1, Math.max(0, (int) Math.round(windSpeedMs / WindMatchRequest.WIND_STEP_MS)));
    }

    private static List<String> warnings(Alternator alt, List<WindMatchPoint> points, AnnualEnergyResult energy) {
        List<String> w = new ArrayList<>(alt.warnings());
        flagRange(points, MatchFlag.STALL).ifPresent(r -> w.add("The alternator stalls the rotor (tip-speed ratio below "
                + "0.6 of its optimum) at " + r + ": it takes too much torque there. Fewer turns, a lower drive ratio "
                + "or a higher battery voltage let the rotor run faster."));
        flagRange(points, MatchFlag.OVER_SPEED).ifPresent(r -> w.add("The rotor would exceed its maximum speed at " + r
                + ": the furling or governor must act there, and the alternator alone cannot hold it."));
        double stalledKWh = 0;
        for (var bin : energy.bins()) {
            int i = index(bin.windSpeedToMs(), points.size());
            if (points.get(i).has(MatchFlag.STALL)) {
                stalledKWh += bin.energyKWh();
            }
        }
        if (energy.annualEnergyKWh() > 0 && stalledKWh > 0.5 * energy.annualEnergyKWh()) {
            w.add(String.format(Locale.ROOT, "%.0f %% of the annual energy comes from stalled operation: the match is poor.",
                    100 * stalledKWh / energy.annualEnergyKWh()));
        }
        return w;
    }

    private static java.util.Optional<String> flagRange(List<WindMatchPoint> points, MatchFlag flag) {
        double[] speeds = points.stream().filter(p -> p.has(flag)).mapToDouble(WindMatchPoint::windSpeedMs).toArray();
        if (speeds.length == 0) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(String.format(Locale.ROOT, "%.1f to %.1f m/s", speeds[0], speeds[speeds.length - 1]));
    }
}
