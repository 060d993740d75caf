package coilwright.system;

import coilwright.cogging.CoggingTorque;
import coilwright.losses.ShaftFriction;
import coilwright.machine.Alternator;
import coilwright.safety.Caution;
import coilwright.safety.MachineLimitCautions;
import coilwright.turbine.EnergyAssumptions;
import coilwright.turbine.FurlingControl;
import coilwright.turbine.NoFurling;
import coilwright.turbine.PowerLimitCurve;
import coilwright.turbine.StartingTorque;
import coilwright.turbine.TailFurling;
import coilwright.turbine.WindDistribution;
import coilwright.turbine.WindRotor;
import coilwright.turbine.WindStarting;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The parts of a wind match beyond the torque balance: over-speed control as the wind the rotor effectively sees
 * ({@link FurlingControl}), starting from rest against cogging and bearing friction ({@link WindStarting}), and
 * what the annual energy assumes ({@link EnergyAssumptions}).
 */
public final class WindAssessment {
    /**
     * Share of the time a starting wind speed must be exceeded for the rotor to start often enough: a rotor that
     * needs a wind blowing less than a tenth of the time is warned about (this project's choice).
     */
    public static final double HARD_START_EXCEEDANCE = 0.10;
    private static final double WIND_ACCURACY_MS = 1e-3;
    private static final int MAX_EVALUATIONS = 100;
    private static final double MAX_WIND_MS = 100;

    private WindAssessment() {
    }

    /** The control in use: the one given, or none. */
    public static FurlingControl control(WindMatchRequest req) {
        return req.furling().orElse(new NoFurling());
    }

    /** The control in words, for the result. */
    public static String describe(FurlingControl control) {
        if (control instanceof TailFurling t) {
            return String.format(Locale.ROOT, "tail furling from %.1f m/s, fully furled at %.1f m/s: the rotor's "
                    + "effective wind is held at %.1f m/s between them (cosine-cubed yaw model)", t.furlStartMs(),
                    t.fullyFurledMs(), t.furlStartMs());
        }
        if (control instanceof PowerLimitCurve c) {
            return "the rotor's power limited by a curve of " + c.points().size() + " points";
        }
        return "none given: the rotor always faces the whole wind (an rpm limit on the rotor still applies)";
    }

    /**
     * The matched point at a free wind speed with the rotor in the wind the control lets through: speed, torque and
     * power all follow the control; the power coefficient is taken against the free wind. The ideal powers are those
     * of a rotor under the same control.
     */
    static WindMatchPoint at(WindMatcher matcher, FurlingControl control, double windSpeedMs) {
        double effective = control.effectiveWindSpeedMs(windSpeedMs, matcher.rotor(), matcher.airDensityKgM3());
        WindMatchPoint p = matcher.at(effective);
        if (effective == windSpeedMs) {
            return p;
        }
        double windW = matcher.rotor().windPowerW(windSpeedMs, matcher.airDensityKgM3());
        return new WindMatchPoint(windSpeedMs, p.rotorSpeedRpm(), p.alternatorSpeedRpm(), p.unlimitedRotorSpeedRpm(),
                p.tipSpeedRatio(), windW > 0 ? p.rotorPowerW() / windW : 0, p.rotorPowerW(), p.drivetrainLossW(),
                p.alternatorShaftPowerW(), p.powerToBatteryW(), p.windingCopperLossW(), p.cableLossW(),
                p.batteryInternalLossW(), p.diodeLossW(), p.dcCurrentA(), p.idealRotorPowerW(), p.idealBatteryPowerW(),
                p.captureRatio(), p.flags(), p.alternatorDragLossW());
    }

    /**
     * Starting from rest: Cq0 by {@link StartingTorque#defaultFor}, the alternator's peak cogging and the assumed
     * bearings' break-away friction ({@link MachineLosses#assumedFriction()}).
     *
     * @param cutInWindSpeedMs the matched cut-in (charging starts), if any
     */
    static WindStart starting(Alternator alt, WindRotor rotor, double airDensityKgM3, OptionalDouble cutInWindSpeedMs,
                              WindDistribution distribution) {
        CoggingTorque cogging = HeatAssessment.cogging(alt);
        ShaftFriction friction = MachineLosses.assumedFriction();
        double cq0 = StartingTorque.defaultFor(rotor);
        double start = WindStarting.startsTurningAtMs(rotor, airDensityKgM3, cq0,
                cogging.peakNm() + friction.breakawayTorqueNm());
        double hard = new BrentSolver(WIND_ACCURACY_MS).solve(MAX_EVALUATIONS,
                v -> distribution.cdf(v) - (1 - HARD_START_EXCEEDANCE), 0, MAX_WIND_MS);
        return new WindStart(cq0, "blade-element estimate at standstill for Glauert-optimum blades of the curve's "
                + "best tip-speed ratio (Wood 2001), at most the curve's own Cp / lambda at zero", cogging.peakNm(),
                friction.breakawayTorqueNm(), start, cutInWindSpeedMs.orElse(0), hard,
                cutInWindSpeedMs.isPresent() ? Math.max(start, cutInWindSpeedMs.getAsDouble()) : 0);
    }

    /** A caution when the rotor starts later than it would charge, or rarely starts at all. */
    static Optional<Caution> startingCaution(WindStart s) {
        return MachineLimitCautions.starting(s.startsTurningAtMs(), s.chargingStartsAtMs(), s.hardStartWindMs());
    }

    /**
     * The steady winding temperature and every loss at the matched point of greatest battery power (the top of the
     * matched curve), in still air at the ambient temperature entered.
     */
    static LossPoint peakHeat(AlternatorCurve curve, java.util.List<WindMatchPoint> points) {
        Alternator alt = curve.alternator();
        double altRpm = points.stream().max(java.util.Comparator.comparingDouble(WindMatchPoint::powerToBatteryW))
                .map(WindMatchPoint::alternatorSpeedRpm).orElse(0.0);
        MachineLosses losses = new MachineLosses(alt, curve.load(), alt.spec().ambientTempC());
        double top = MachineLosses.maxSpeedRpm(alt);
        // the matched point is on the curve already: the fixed point starts from it
        return altRpm <= top ? losses.steadyAt(curve.at(altRpm)) : losses.steadyAt(top);
    }

    /** A caution when the winding at the top of the matched curve is above or near its insulation class. */
    static Optional<Caution> peakHeatCaution(Alternator alt, LossPoint peak) {
        return MachineLimitCautions.windingTemperature(Math.min(peak.windingHotSpotC(), 1000),
                alt.spec().insulationClass(), String.format(Locale.ROOT, "at the top of the matched curve (%.0f rpm)",
                        peak.speedRpm()), false);
    }

    /** Drivetrain efficiency as entered with the rotor; availability as given or the default. */
    static EnergyAssumptions energyAssumptions(WindMatchRequest req) {
        WindRotor rotor = req.rotor();
        EnergyAssumptions defaults = EnergyAssumptions.defaults(rotor.driveRatio());
        String drive = rotor.drivetrainEfficiency() == 1.0 && rotor.driveRatio() != 1.0
                ? "entered as 1 with a drive ratio of " + fmt(rotor.driveRatio()) + ": optimistic, a belt or gear "
                + "stage loses 2 to 7 % (common practice)"
                : "entered with the rotor; " + defaults.drivetrainBasis();
        return req.availability().isPresent()
                ? new EnergyAssumptions(rotor.drivetrainEfficiency(), drive, req.availability().getAsDouble(),
                "entered")
                : new EnergyAssumptions(rotor.drivetrainEfficiency(), drive, defaults.availability(),
                defaults.availabilityBasis());
    }

    private static String fmt(double x) {
        return coilwright.validation.Checks.fmt(x);
    }
}
