package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.conductor.ThermalClass;
import coilwright.safety.Caution;
import org.junit.jupiter.api.Test;

/** The hydro match's heat block: the steady winding at the matched speed and its cautions. */
class HydroHeatTest {
    /** Shaft power = output + every loss to this share: the rectifier solver's balance (1e-9) with room for rounding. */
    private static final double BALANCE = 1e-6;

    private static HydroMatchRequest request(ThermalClass insulation, double ambientC) {
        HydroMatchRequest base = MatchFixtures.hydroRequest(MatchFixtures.site(), MatchFixtures.impulseFor(400));
        var spec = base.alternator().withAmbientTempC(ambientC);
        spec = new coilwright.machine.AlternatorSpec(spec.winding(), spec.turnsPerCoil(), spec.connection(),
                spec.rotor(), spec.stator(), spec.wire(), spec.cooling(), insulation, spec.windingTempC(),
                spec.magnetTempC(), spec.measuredKeLineVPerRpm(), spec.phaseInductanceH(), spec.ambientTempC());
        return new HydroMatchRequest(spec, base.load(), base.site(), base.penstock(), base.runner(), base.driveRatio(),
                base.drivetrainEfficiency(), base.waterTempC());
    }

    @Test
    void the_heat_block_is_the_steady_state_at_the_matched_alternator_speed_and_balances() {
        HydroMatchResult r = HydroMatcher.match(request(ThermalClass.H, 25));
        LossPoint h = r.heat();
        assertEquals(r.matched().alternatorSpeedRpm(), h.speedRpm(), 1e-9);
        // energy balance: shaft = output + every loss (the property the issue asks for at every point)
        assertEquals(h.shaftPowerW(), h.powerToLoadW() + h.totalLossW(), BALANCE * h.shaftPowerW());
        assertTrue(h.windingMeanC() > 25 && h.windingHotSpotC() >= h.windingMeanC(), () -> "temperatures " + h);
        // the same steady state MachineLosses gives on its own at that speed (one model, not a copy)
        LossPoint direct = new MachineLosses(MatchFixtures.AXIAL, MatchFixtures.BATTERY_48V, 25).steadyAt(h.speedRpm());
        assertEquals(direct.windingMeanC(), h.windingMeanC(), 0.02, "fixed point solved to 0.01 K");
    }

    @Test
    void a_hotter_site_runs_the_winding_hotter_but_by_no_more_than_the_difference_in_ambient_allows() {
        // source: Newton's law of cooling, q = h A (T - T_amb) (Incropera & DeWitt, Fundamentals of Heat and Mass
        // Transfer, 6th ed., eq. 1.3a): with the same losses the winding moves with the ambient, 20 K here. Into a
        // battery the hotter copper's higher resistance lowers the current and so the losses (IEC 60028 copper), so
        // the winding rises less than the ambient; film properties and radiation allow up to 30 % more at most
        double cool = HydroMatcher.match(request(ThermalClass.H, 20)).heat().windingMeanC();
        double hot = HydroMatcher.match(request(ThermalClass.H, 40)).heat().windingMeanC();
        assertTrue(hot - cool > 0 && hot - cool <= 1.3 * 20, () -> "rise " + cool + " -> " + hot);
    }

    @Test
    void a_winding_over_its_insulation_class_is_warned_about_and_one_within_it_is_not() {
        // IEC 60085 class limits: A 105 C ... H 180 C; the caution follows the solved hot spot, whichever class
        boolean anyOver = false;
        for (ThermalClass c : ThermalClass.values()) {
            HydroMatchResult r = HydroMatcher.match(request(c, 60));
            boolean over = r.heat().windingHotSpotC() > c.limitC();
            anyOver |= over;
            boolean warned = r.cautions().stream().anyMatch(x -> x.code().equals("WINDING_OVER_TEMPERATURE")
                    && x.severity() == Caution.Severity.WARNING && x.message().contains("matched speed"));
            assertEquals(over, warned, () -> c + ": hot spot " + r.heat().windingHotSpotC() + ", " + r.cautions());
        }
        assertTrue(anyOver, "the fixture should exceed at least the lowest class at a 60 C site");
    }
}
