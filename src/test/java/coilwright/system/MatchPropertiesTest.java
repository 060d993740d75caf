package coilwright.system;

import coilwright.turbine.HydroRunner;
import coilwright.turbine.ImpulseRunner;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindRotor;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Properties of matching over random rotors, drives and wind speeds. Energy balance tolerance: 1e-6 relative. The
 * Brent solver stops within 1e-9 rpm, where the torque residual is about 1e-9 of the torque (the alternator's torque
 * changes by about 1e-9 relative per 1e-9 relative speed, see the load solver's smoothness); 1e-6 leaves a margin of
 * a thousand for the rectifier solver's own convergence.
 */
class MatchPropertiesTest {
    private static final double RHO = 1.225;

    private static WindMatcher matcher(WindRotor rotor) {
        return new WindMatcher(new AlternatorCurve(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V), rotor, RHO, 25);
    }

    private static WindRotor rotor(double diameterM, double cpMax, double tsrOpt, double ratio, double eta) {
        return new WindRotor(diameterM, 3, new ParametricCp(cpMax, tsrOpt), 0, ratio, eta);
    }

    @Property(tries = 25)
    void the_matched_speed_never_exceeds_free_spinning_and_energy_balances(
            @ForAll @DoubleRange(min = 1.5, max = 5) double diameterM, @ForAll @DoubleRange(min = 0.25, max = 0.5) double cpMax,
            @ForAll @DoubleRange(min = 4, max = 9) double tsrOpt, @ForAll @DoubleRange(min = 0.7, max = 3) double ratio,
            @ForAll @DoubleRange(min = 0.8, max = 1) double eta, @ForAll @DoubleRange(min = 0.5, max = 20) double windMs) {
        WindRotor r = rotor(diameterM, cpMax, tsrOpt, ratio, eta);
        WindMatchPoint p = matcher(r).at(windMs);
        assertTrue(p.rotorSpeedRpm() <= r.freeSpinSpeedRpm(windMs) * (1 + 1e-12), p.toString());
        double balance = Math.abs(p.rotorPowerW() - p.powerToBatteryW() - p.totalLossW());
        assertTrue(balance <= 1e-6 * Math.max(p.rotorPowerW(), 1e-9), "imbalance " + balance + " of " + p.rotorPowerW());
        assertTrue(p.powerToBatteryW() >= 0 && p.totalLossW() >= 0);
    }

    @Property(tries = 10)
    void more_wind_never_gives_a_lower_matched_speed(
            @ForAll @DoubleRange(min = 1.5, max = 5) double diameterM, @ForAll @DoubleRange(min = 4, max = 9) double tsrOpt,
            @ForAll @DoubleRange(min = 0.7, max = 3) double ratio) {
        WindMatcher m = matcher(rotor(diameterM, 0.4, tsrOpt, ratio, 0.95));
        double previous = 0;
        for (double v = 0.5; v <= 20; v += 1.5) {
            double n = m.at(v).unlimitedRotorSpeedRpm();
            assertTrue(n >= previous * (1 - 1e-9), "v = " + v + ": " + n + " < " + previous);
            previous = n;
        }
    }

    @Property(tries = 20)
    void a_hydro_runner_never_runs_past_runaway_and_energy_balances(
            @ForAll @DoubleRange(min = 5, max = 60) double headM, @ForAll @DoubleRange(min = 0.002, max = 0.03) @net.jqwik.api.constraints.Scale(4) double flowM3s,
            @ForAll @DoubleRange(min = 200, max = 1200) double optimumRpm, @ForAll @DoubleRange(min = 0.8, max = 1) double eta) {
        HydroRunner runner = ImpulseRunner.forTargetSpeed(headM, flowM3s, 2, optimumRpm);
        HydroOperatingPoint p = HydroMatcher.matchAt(new AlternatorCurve(MatchFixtures.AXIAL, MatchFixtures.BATTERY_48V),
                runner, 1.0, eta);
        assertTrue(p.runnerSpeedRpm() <= runner.runawaySpeedRpm() * (1 + 1e-12));
        double balance = Math.abs(p.runnerPowerW() - p.powerToBatteryW() - p.totalLossW());
        assertTrue(balance <= 1e-6 * Math.max(p.runnerPowerW(), 1e-9), "imbalance " + balance);
    }
}
