package coilwright.sizing;

import coilwright.load.BatteryLoad;
import coilwright.machine.Alternator;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.SpeedPoint;
import coilwright.system.WindMatchPoint;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.system.WindMatching;
import coilwright.turbine.AnnualEnergy;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindDistribution;
import coilwright.turbine.WindRotor;
import coilwright.validation.InfeasibleDesignException;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A wind rotor on its site. Full model: {@link WindMatching} over the wind-speed table, the rated point's current
 * density and efficiency from the operating point at the matched speed of the rated wind.
 *
 * <p>Bounds. At every tabulated wind speed v the matched rotor runs at most at its free-spinning speed (the matcher
 * scans no further) or, when governed, at its speed limit, so the alternator turns at most at n_top(v); and it
 * charges only at or above its cut-in speed n_c. The power into the alternator shaft is then at most drivetrain
 * efficiency x 0.5 rho A v^3 x Cp, with Cp its largest value at tip-speed ratios between those of n_c and n_top(v)
 * (when governed, the alternator takes less than the rotor offers at the speed limit). For the parametric curve,
 * which rises to its optimum and falls after it, that is Cp at the optimum clamped into the range; for a table, its
 * peak. The battery power is at most V_b times the smaller of {@link BridgeBounds#maxDcCurrentA} at n_top(v) and
 * {@link BridgeBounds#dcCurrentFromShaftPowerA}; summed with the bin method's own weights (which are not negative)
 * it bounds the annual energy.
 */
final class WindDriveModel implements DriveModel {
    private final WindDrive drive;
    private final BatteryLoad load;
    private final LoadConstants lc;
    private final double[] topSpeedRpm;
    /** Drivetrain efficiency x the wind's power through the swept area, per row, W. */
    private final double[] windShaftW;
    /** Tip-speed ratio per alternator rpm, per row. */
    private final double[] tsrPerRpm;
    private final ParametricCp parametric;
    /** The curve's peak, worked out once (a table's peak is searched for). */
    private final double maxCp;
    /** Cp sampled every {@link #CP_STEP} in tip-speed ratio, for the estimates (a table's spline is slow to build). */
    private final double[] cpSamples;
    /** Rows whose weight is below this share of the heaviest are left out of the estimate. */
    private final double estimateWeightFloor;
    private final double[] energyWeightKWhPerW;
    private final double checkSpeedRpm;
    private final String checkSpeedSource;
    private final double maxCutInWindSpeedMs;

    /**
     * @param maxCutInWindSpeedMs the cut-in wind limit, m/s; 0 = none
     */
    /** Tip-speed ratio step of the sampled Cp curve. */
    private static final double CP_STEP = 0.02;

    WindDriveModel(WindDrive drive, BatteryLoad load, LoadConstants lc, double maxCutInWindSpeedMs) {
        this.drive = drive;
        this.maxCutInWindSpeedMs = maxCutInWindSpeedMs;
        this.load = load;
        this.lc = lc;
        WindRotor rotor = drive.rotor();
        double rho = drive.site().effectiveAirDensityKgM3();
        int rows = (int) Math.round(drive.maxWindSpeedMs() / WindMatchRequest.WIND_STEP_MS) + 1;
        topSpeedRpm = new double[rows];
        windShaftW = new double[rows];
        tsrPerRpm = new double[rows];
        parametric = rotor.curve() instanceof ParametricCp p ? p : null;
        maxCp = rotor.curve().maxCp();
        cpSamples = new double[(int) Math.ceil(rotor.curve().runawayTipSpeedRatio() / CP_STEP) + 2];
        for (int k = 0; k < cpSamples.length; k++) {
            cpSamples[k] = rotor.curve().cp(k * CP_STEP);
        }
        for (int i = 1; i < rows; i++) {
            double v = i * WindMatchRequest.WIND_STEP_MS;
            double rotorTop = rotor.freeSpinSpeedRpm(v);
            if (rotor.maxRotorSpeedRpm() > 0) {
                rotorTop = Math.min(rotorTop, rotor.maxRotorSpeedRpm());
            }
            topSpeedRpm[i] = rotor.alternatorSpeedRpm(rotorTop);
            windShaftW[i] = rotor.drivetrainEfficiency() * rotor.windPowerW(v, rho);
            tsrPerRpm[i] = rotor.tipSpeedRatio(v, 1.0) / rotor.driveRatio();
        }
        energyWeightKWhPerW = weights(drive, rows);
        estimateWeightFloor = 1e-4 * java.util.Arrays.stream(energyWeightKWhPerW).max().orElse(0);
        boolean limited = rotor.maxRotorSpeedRpm() > 0;
        checkSpeedRpm = rotor.alternatorSpeedRpm(limited ? rotor.maxRotorSpeedRpm()
                : rotor.freeSpinSpeedRpm(drive.maxWindSpeedMs()));
        checkSpeedSource = limited ? "the rotor's maximum (furling or governor) speed"
                : String.format(Locale.ROOT, "the rotor's free-spinning speed at %.1f m/s", drive.maxWindSpeedMs());
    }

    /** The bin method's weight of each tabulated power, kWh per W, from the method itself (unit powers). */
    private static double[] weights(WindDrive drive, int rows) {
        WindDistribution distribution = drive.wind().distribution();
        double[] w = new double[rows];
        for (int i = 0; i < rows; i++) {
            int row = i;
            w[i] = AnnualEnergy.binMethod(v -> Math.round(v / WindMatchRequest.WIND_STEP_MS) == row ? 1.0 : 0.0,
                    distribution, WindMatchRequest.WIND_STEP_MS, drive.maxWindSpeedMs(), 1.0).annualEnergyKWh();
        }
        return w;
    }

    @Override
    public LoadConstants constants() {
        return lc;
    }

    @Override
    public double checkSpeedRpm() {
        return checkSpeedRpm;
    }

    @Override
    public String checkSpeedSource() {
        return checkSpeedSource;
    }

    /** The top speed at the last table row at or below the cut-in wind limit (the top row without one). */
    @Override
    public double highestCutInRpm() {
        double limitMs = maxCutInWindSpeedMs > 0 ? maxCutInWindSpeedMs : drive.maxWindSpeedMs();
        int row = (int) Math.floor(limitMs / WindMatchRequest.WIND_STEP_MS + 1e-9);
        return topSpeedRpm[Math.min(topSpeedRpm.length - 1, row)];
    }


    @Override
    public double ratedPowerBoundW(ScreenValues s) {
        return rowBoundW(s, drive.ratedRow());
    }

    private double rowBoundW(ScreenValues s, int row) {
        double top = topSpeedRpm[row];
        if (top <= s.cutInRpm * (1 - Limit.SCREEN_MARGIN)) {
            return 0;
        }
        double d = Math.min(s.maxDcCurrentA(top, lc), s.dcCurrentFromShaftPowerA(rowShaftBoundW(s, row), lc));
        return lc.batteryV() * d;
    }

    /** The most shaft power the rotor gives at a row between the cut-in speed and its top speed, W. */
    private double rowShaftBoundW(ScreenValues s, int row) {
        double cp = parametric == null ? maxCp
                : parametric.cp(Math.max(s.cutInRpm * (1 - Limit.SCREEN_MARGIN) * tsrPerRpm[row],
                Math.min(parametric.optimumTipSpeedRatio(), topSpeedRpm[row] * tsrPerRpm[row])));
        return windShaftW[row] * cp;
    }

    @Override
    public double ratedShaftTorqueBoundNm(ScreenValues s) {
        int row = drive.ratedRow();
        if (topSpeedRpm[row] <= s.cutInRpm * (1 - Limit.SCREEN_MARGIN)) {
            return 0;
        }
        return DriveModel.torqueBoundNm(rowShaftBoundW(s, row), s.cutInRpm * (1 - Limit.SCREEN_MARGIN));
    }

    @Override
    public double energyBoundKWh(ScreenValues s) {
        double sum = 0;
        for (int i = 1; i < topSpeedRpm.length; i++) {
            sum += energyWeightKWhPerW[i] * rowBoundW(s, i);
        }
        return sum;
    }

    @Override
    public double ratedPowerEstimateW(ScreenValues s) {
        return rowEstimateW(s, drive.ratedRow());
    }

    /**
     * The match estimate summed over the table. Rows that carry almost no weight are left out, and each row's search
     * starts from the speed the previous row settled at (the rotor runs faster in more wind): it is an estimate.
     */
    @Override
    public double energyEstimateKWh(ScreenValues s) {
        double sum = 0;
        double fromRpm = s.cutInRpm;
        for (int i = 1; i < topSpeedRpm.length; i++) {
            if (energyWeightKWhPerW[i] < estimateWeightFloor || topSpeedRpm[i] <= fromRpm) {
                continue;
            }
            double wind = windShaftW[i];
            double tsr = tsrPerRpm[i];
            double rpm = MatchEstimate.matchRpm(s, n -> wind * sampledCp(n * tsr), fromRpm, topSpeedRpm[i], lc);
            sum += energyWeightKWhPerW[i] * lc.batteryV() * MatchEstimate.dcCurrentA(s, rpm, lc);
            fromRpm = rpm;
        }
        return sum;
    }

    private double rowEstimateW(ScreenValues s, int row) {
        double wind = windShaftW[row];
        double tsr = tsrPerRpm[row];
        return MatchEstimate.batteryPowerW(s, n -> wind * sampledCp(n * tsr), topSpeedRpm[row], lc);
    }

    /** Cp between the samples, on straight lines; 0 beyond the free-spinning ratio. */
    private double sampledCp(double tsr) {
        double k = tsr / CP_STEP;
        int i = (int) k;
        if (i >= cpSamples.length - 1) {
            return 0;
        }
        return cpSamples[i] + (k - i) * (cpSamples[i + 1] - cpSamples[i]);
    }

    @Override
    public boolean hasEnergy() {
        return true;
    }

    /** The lowest tabulated wind speed at which the rotor can reach the cut-in speed: a lower bound of the cut-in. */
    private double cutInWindBoundMs(ScreenValues s) {
        for (int i = 1; i < topSpeedRpm.length; i++) {
            if (topSpeedRpm[i] >= s.cutInRpm * (1 - Limit.SCREEN_MARGIN)) {
                return i * WindMatchRequest.WIND_STEP_MS;
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public List<Limit> limits() {
        List<Limit> out = new ArrayList<>();
        out.add(new ChargingLimit(topSpeedRpm[topSpeedRpm.length - 1], String.format(Locale.ROOT,
                "the highest speed the rotor reaches up to %.1f m/s", drive.maxWindSpeedMs())));
        if (maxCutInWindSpeedMs > 0) {
            out.add(FigureLimit.atMost("cutInWindSpeed", "limits.maxCutInWindSpeedMs", "m/s", maxCutInWindSpeedMs, "reaches cut-in at %.1f m/s with this rotor",
                    this::cutInWindBoundMs, FullEvaluation::cutInWindSpeedMs));
        }
        return out;
    }

    @Override
    public FullEvaluation evaluate(Alternator alt) {
        double cutIn = AlternatorEvaluator.closedFormCutInRpm(alt, load);
        WindMatchResult r;
        try {
            // without the running drag for now: the worked example's hand calculation and the sizing tests are drag-free
            r = WindMatching.matchWithoutDrag(alt, drive.matchRequest(alt.spec(), load));
        } catch (InfeasibleDesignException e) {
            return FullEvaluation.neverCharges(alt, cutIn, alt.emfLineRmsV(checkSpeedRpm), checkSpeedRpm,
                    AlternatorEvaluator.cautionsAt(alt, load, checkSpeedRpm, checkSpeedSource, 0, 0));
        }
        WindMatchPoint ratedWind = r.points().get(drive.ratedRow());
        SpeedPoint rated = AlternatorEvaluator.point(alt, load, ratedWind.alternatorSpeedRpm());
        return FullEvaluation.of(alt, true, cutIn, r.cutInWindSpeedMs().orElse(Double.POSITIVE_INFINITY), rated,
                r.openCircuitLineRmsVAtCheckSpeed(), r.checkSpeedRpm(), r.annualEnergy().annualEnergyKWh(),
                r.cautions());
    }
}
