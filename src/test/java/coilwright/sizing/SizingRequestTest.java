package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every bad requirement is refused with the field, the value and what is allowed. */
class SizingRequestTest {

    private static FieldError only(Executable e) {
        InvalidInputException x = assertThrows(InvalidInputException.class, e);
        assertEquals(1, x.errors().size(), x::getMessage);
        return x.errors().get(0);
    }

    @Test
    void speed_targets_need_the_rated_speed_above_the_cut_in() {
        FieldError e = only(() -> new SpeedTargets(200, 150, 500, 0));
        assertEquals("ratedSpeedRpm", e.field());
        assertEquals("ratedSpeedRpm = 150.0: must be above cutInSpeedRpm = 200.0", e.message());
        assertEquals("maxSpeedRpm", only(() -> new SpeedTargets(100, 300, 500, 200)).field());
        assertEquals("> 0.0 and <= 1000000.0", only(() -> new SpeedTargets(100, 300, -5, 0)).allowed());
    }

    @Test
    void winding_temperature_and_cogging_limits_are_refused_out_of_range() {
        Limits none = Limits.defaults();
        FieldError t = only(() -> none.withMaxWindingTempC(300));
        assertEquals("maxWindingTempC", t.field());
        assertTrue(t.allowed().contains("250"), t.allowed());
        assertEquals("maxWindingTempC", only(() -> none.withMaxWindingTempC(20)).field());
        assertEquals("maxWindingTempC", only(() -> none.withMaxWindingTempC(Double.NaN)).field());
        FieldError c = only(() -> none.withMaxCoggingPercent(0));
        assertEquals("maxCoggingPercent", c.field());
        assertTrue(c.allowed().contains("100"), c.allowed());
        assertEquals("maxCoggingPercent", only(() -> none.withMaxCoggingPercent(150)).field());
        assertTrue(none.maxWindingTempC().isEmpty() && none.maxCoggingPercent().isEmpty(), "absent by default");
    }

    @Test
    void wind_speeds_follow_the_table_step() {
        WindDrive ok = SizingFixtures.wind3m();
        FieldError e = only(() -> new WindDrive(ok.rotor(), ok.site(), ok.wind(), 25, 10.2));
        assertEquals("ratedWindSpeedMs", e.field());
        assertTrue(e.message().contains("multiple of 0.5 m/s"), e.message());
        assertEquals("ratedWindSpeedMs", only(() -> new WindDrive(ok.rotor(), ok.site(), ok.wind(), 25, 30)).field());
    }

    @Test
    void magnets_must_be_a_known_grade_with_distinct_counts() {
        FieldError e = only(() -> new MagnetOption("N99", 0.04, 0.05, 0.01, List.of(1)));
        assertEquals("gradeName", e.field());
        assertTrue(e.allowed().contains("N42"), e.allowed());
        assertEquals("countsPerPole", only(() -> new MagnetOption("N42", 0.04, 0.05, 0.01, List.of(2, 2))).field());
        assertEquals("countsPerPole[0]", only(() -> new MagnetOption("N42", 0.04, 0.05, 0.01, Arrays.asList(
                (Integer) null))).field());
        assertEquals("countsPerPole[1]", only(() -> new MagnetOption("N42", 0.04, 0.05, 0.01, List.of(1, 9))).field());
    }

    @Test
    void builds_check_their_sizes_and_pole_range() {
        MagnetOption m = new MagnetOption("N42", 0.04, 0.05, 0.01, List.of(1));
        FieldError odd = only(() -> new AxialBuild(List.of(0.4), 0.01, List.of(0.013), 0.0015, 0.001, 12, 17,
                List.of(m), 40));
        assertEquals("maxPoles", odd.field());
        assertEquals("discDiametersM[1]", only(() -> new AxialBuild(List.of(0.4, 5.0), 0.01, List.of(0.013), 0.0015,
                0.001, 12, 16, List.of(m), 40)).field());
        assertEquals("magnets.size", only(() -> new AxialBuild(List.of(0.4), 0.01, List.of(0.013), 0.0015, 0.001, 12,
                16, List.of(), 40)).field());
        RadialBuild ok = SizingFixtures.motorStator(8, 12);
        FieldError slots = only(() -> new RadialBuild(ok.side(), ok.gapDiameterM(), ok.stackLengthM(), 35, ok.stator(),
                ok.airGapM(), ok.slotOpeningM(), ok.layers(), 8, 12, ok.magnets(), 50));
        assertEquals("slots", slots.field());
        assertEquals("multiples of 3", slots.allowed());
    }

    @Test
    void wire_and_winding_ranges_must_not_be_reversed() {
        FieldError wire = only(() -> WireRange.awg(20, 14, 2));
        assertEquals("thinnestAwg", wire.field());
        assertTrue(wire.message().contains("larger gauge number is thinner"), wire.message());
        assertEquals("maxDiameterM", only(() -> WireRange.metric(0.0011, 0.00111, 1)).field());
        FieldError turns = only(() -> new WindingChoices(50, 10, WireRange.awg(14, 18, 2), List.of(Connection.STAR),
                1, 0.9, Cooling.OPEN_VENTILATED, ThermalClass.F, 80));
        assertEquals("maxTurnsPerCoil", turns.field());
        assertEquals("connections", only(() -> new WindingChoices(10, 50, WireRange.awg(14, 18, 2),
                List.of(Connection.STAR, Connection.STAR), 1, 0.9, Cooling.OPEN_VENTILATED, ThermalClass.F, 80)).field());
    }

    @Test
    void limits_are_zero_for_the_default_or_in_their_range() {
        FieldError e = only(() -> new Limits(0.2, 0, 0, 0, 0));
        assertEquals("maxCurrentDensityAPerMm2", e.field());
        assertEquals("0, or 0.5 to 30.0", e.allowed());
        assertEquals("minEfficiency", only(() -> new Limits(0, 0, 1.2, 0, 0)).field());
        assertEquals("maxFill", only(() -> new Limits(0, 0.9, 0, 0, 0)).field());
    }

    @Test
    void the_request_checks_what_its_parts_must_agree_on() {
        SizingRequest wind = SizingFixtures.smallAxialWind(Objective.ANNUAL_ENERGY);
        SizingRequest speed = SizingFixtures.smallAxialSpeed(Objective.OUTPUT_AT_RATED, Limits.defaults());
        FieldError energy = only(() -> new SizingRequest(speed.drive(), speed.load(), speed.build(), speed.winding(),
                speed.limits(), Objective.ANNUAL_ENERGY, speed.prices(), 3, 100));
        assertEquals("objective", energy.field());
        FieldError cost = only(() -> new SizingRequest(speed.drive(), speed.load(), speed.build(), speed.winding(),
                speed.limits(), Objective.MATERIAL_COST, MaterialPrices.none(), 3, 100));
        assertEquals("prices", cost.field());
        FieldError cutInWind = only(() -> new SizingRequest(speed.drive(), speed.load(), speed.build(),
                speed.winding(), new Limits(0, 0, 0, 0, 3), Objective.OUTPUT_AT_RATED, speed.prices(), 3, 100));
        assertEquals("limits.maxCutInWindSpeedMs", cutInWind.field());
        BatteryLoad single = new BatteryLoad(wind.load().battery(), new Rectifier(BridgeType.SINGLE_PHASE_BRIDGE,
                DiodeType.SILICON), wind.load().acCable(), wind.load().dcCable());
        assertEquals("load.rectifier.type", only(() -> new SizingRequest(wind.drive(), single, wind.build(),
                wind.winding(), wind.limits(), wind.objective(), wind.prices(), 3, 100)).field());
        assertEquals("resultCount", only(() -> new SizingRequest(wind.drive(), wind.load(), wind.build(),
                wind.winding(), wind.limits(), wind.objective(), wind.prices(), 0, 100)).field());
    }
}
