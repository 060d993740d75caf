package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.losses.ShaftFriction;
import coilwright.turbine.WindRotor;
import org.junit.jupiter.api.Test;

/** The alternator's running drag in the wind match: where charging really starts, and the energy balance. */
class RunningDragTest {
    private static final double RHO = 1.225;
    /** Energy balance to this share of the rotor power: the rectifier solver's balance (1e-9) with room for rounding. */
    private static final double BALANCE = 1e-6;

    private static WindMatcher matcher(RunningDrag drag) {
        return new WindMatcher(new AlternatorCurve(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V), MatchFixtures.rotor(),
                RHO, 25, drag);
    }

    private static RunningDrag drag() {
        return RunningDrag.of(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V);
    }

    private static double cutInMs(WindMatcher m) {
        for (double v = 0.5; v <= 25; v += 0.5) {
            if (m.at(v).powerToBatteryW() > 0) {
                return v;
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    @Test
    void the_drag_is_at_least_the_bearings_running_friction_and_zero_at_rest() {
        RunningDrag d = drag();
        ShaftFriction bearings = MachineLosses.assumedFriction();
        assertEquals(0, d.torqueNm(0), 0);
        for (double n : new double[]{10, 50, 100, 300}) {
            // bearings alone: power / omega; windage and conductor eddy currents add to it
            double bearingNm = bearings.powerW(n) / (n * Math.PI / 30);
            assertTrue(d.torqueNm(n) >= bearingNm - 1e-12, () -> n + " rpm: " + d.torqueNm(n) + " < " + bearingNm);
            assertEquals(d.torqueNm(n) * n * Math.PI / 30, d.powerW(n), 1e-12 * d.powerW(n));
        }
    }

    @Test
    void below_cut_in_the_rotor_settles_where_its_torque_equals_the_drag_slower_than_free_spinning() {
        // source: Newton's second law for rotation at steady speed, J dw/dt = T_rotor - T_load = 0 (Halliday, Resnick
        // & Walker, Fundamentals of Physics, ch. 10); the root is found to TorqueMatch.ABSOLUTE_ACCURACY_RPM, so the
        // balance holds to the torque slope times that, far inside 1e-6
        WindRotor rotor = MatchFixtures.rotor();
        RunningDrag d = drag();
        double v = 1.0;
        WindMatchPoint p = matcher(d).at(v);
        assertTrue(p.has(MatchFlag.FREE_SPINNING), "no load current at 1 m/s");
        assertTrue(p.rotorSpeedRpm() < rotor.freeSpinSpeedRpm(v), "drag slows the free-spinning rotor");
        double n = p.alternatorSpeedRpm();
        assertEquals(d.torqueNm(n), rotor.alternatorShaftTorqueNm(v, n, RHO), 1e-6 * d.torqueNm(n));
        assertEquals(p.alternatorDragLossW(), p.alternatorShaftPowerW(), 1e-12);
        assertEquals(p.rotorPowerW(), p.drivetrainLossW() + p.alternatorShaftPowerW(), BALANCE * p.rotorPowerW());
    }

    @Test
    void drag_never_lowers_the_cut_in_wind_speed_and_raises_it_here() {
        double without = cutInMs(matcher(RunningDrag.none()));
        double with = cutInMs(matcher(drag()));
        assertTrue(with >= without, () -> without + " m/s without drag, " + with + " with");
        assertTrue(Double.isFinite(with));
    }

    @Test
    void every_matched_point_balances_with_the_drag_counted() {
        WindMatcher m = matcher(drag());
        for (double v = 0.5; v <= 20; v += 0.5) {
            WindMatchPoint p = m.at(v);
            if (p.has(MatchFlag.OVER_SPEED) || p.has(MatchFlag.FREE_SPINNING)) {
                assertEquals(p.rotorPowerW(), p.powerToBatteryW() + p.totalLossW(), BALANCE * p.rotorPowerW());
            } else {
                // the rotor's own power at the matched speed: balanced to the root's tolerance
                assertEquals(p.rotorPowerW(), p.powerToBatteryW() + p.totalLossW(), 1e-6 * p.rotorPowerW(),
                        () -> "at " + p);
            }
            assertTrue(p.alternatorDragLossW() >= 0);
            if (p.powerToBatteryW() > 0) {
                assertEquals(p.captureRatio(), p.powerToBatteryW() / p.idealBatteryPowerW(), 1e-9,
                        "capture ratio = battery / ideal battery with the drag in both");
            }
        }
    }

    @Test
    void the_full_match_reports_the_real_start_from_rest() {
        WindMatchResult r = WindMatching.match(MatchFixtures.windRequest(MatchFixtures.rotor()));
        WindStart s = r.starting();
        assertEquals(r.cutInWindSpeedMs().orElseThrow(), s.chargingStartsAtMs(), 0);
        assertEquals(Math.max(s.startsTurningAtMs(), s.chargingStartsAtMs()), s.chargesFromRestAtMs(), 0);
        assertTrue(r.points().stream().anyMatch(p -> p.alternatorDragLossW() > 0), "the match counts the drag");
    }
}
