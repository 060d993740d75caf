package coilwright.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.machine.SampleDesigns;
import coilwright.turbine.EnergyAssumptions;
import coilwright.turbine.FurlingControl;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.TailFurling;
import coilwright.turbine.WindRotor;
import coilwright.validation.InvalidInputException;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class WindAssessmentTest {
    /** No rpm cap, so only the furling control limits the rotor. */
    private static final WindRotor UNCAPPED = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 0, 1.0, 1.0);

    private static WindMatchRequest request(Optional<FurlingControl> furling, OptionalDouble availability) {
        WindMatchRequest r = MatchFixtures.windRequest(UNCAPPED);
        return new WindMatchRequest(r.alternator(), r.load(), r.rotor(), r.site(), r.wind(), r.maxWindSpeedMs(),
                furling, availability);
    }

    private static WindMatchPoint at(List<WindMatchPoint> points, double windMs) {
        return points.stream().filter(p -> p.windSpeedMs() == windMs).findFirst().orElseThrow();
    }

    @Test
    void tail_furling_holds_the_rotor_at_its_furl_start_wind_and_leaves_lower_winds_alone() {
        WindMatchResult free = WindMatching.match(request(Optional.empty(), OptionalDouble.empty()));
        WindMatchResult furled = WindMatching.match(request(Optional.of(new TailFurling(10, 16)), OptionalDouble.empty()));
        for (double v : new double[]{4, 7, 10}) {
            assertEquals(at(free.points(), v), at(furled.points(), v), "below furl start nothing changes at " + v);
        }
        WindMatchPoint atStart = at(furled.points(), 10);
        for (double v : new double[]{11, 13, 16}) {
            WindMatchPoint p = at(furled.points(), v);
            // between furl start and the stop the rotor sees the furl-start wind: the same operating point
            assertEquals(atStart.rotorPowerW(), p.rotorPowerW(), 1e-9 * atStart.rotorPowerW(), "held at " + v);
            assertEquals(atStart.powerToBatteryW(), p.powerToBatteryW(), 1e-9 * atStart.powerToBatteryW());
            assertTrue(p.cp() < atStart.cp(), "Cp against the free wind falls as the rotor turns away");
            assertTrue(at(free.points(), v).rotorPowerW() > p.rotorPowerW(), "unfurled takes more at " + v);
        }
        assertTrue(furled.annualEnergy().annualEnergyKWh() < free.annualEnergy().annualEnergyKWh());
        assertTrue(furled.overSpeedControl().startsWith("tail furling from 10.0 m/s"));
    }

    @Test
    void delivered_energy_is_the_bin_method_energy_times_the_availability() {
        WindMatchResult byDefault = WindMatching.match(request(Optional.empty(), OptionalDouble.empty()));
        assertEquals(EnergyAssumptions.DEFAULT_AVAILABILITY, byDefault.energyAssumptions().availability());
        assertEquals(byDefault.annualEnergy().annualEnergyKWh() * EnergyAssumptions.DEFAULT_AVAILABILITY,
                byDefault.deliveredAnnualEnergyKWh(), 1e-9);
        WindMatchResult entered = WindMatching.match(request(Optional.empty(), OptionalDouble.of(0.8)));
        assertEquals(0.8 * entered.annualEnergy().annualEnergyKWh(), entered.deliveredAnnualEnergyKWh(), 1e-9);
        assertEquals("entered", entered.energyAssumptions().availabilityBasis());
        assertEquals(1.0, entered.energyAssumptions().drivetrainEfficiency(), "direct drive as entered");
    }

    @Test
    void an_availability_outside_half_to_one_is_refused_by_name() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> request(Optional.empty(), OptionalDouble.of(0.3)));
        assertTrue(e.getMessage().contains("availability"), e.getMessage());
    }

    @Test
    void an_air_cored_machine_starts_against_bearing_friction_alone_at_a_low_wind() {
        WindStart s = WindMatching.match(MatchFixtures.windRequest(MatchFixtures.rotor())).starting();
        assertEquals(0, s.coggingPeakNm());
        assertEquals(MachineLosses.assumedFriction().breakawayTorqueNm(), s.breakawayFrictionNm(), 1e-12);
        assertTrue(s.startsTurningAtMs() > 0 && s.startsTurningAtMs() < s.chargingStartsAtMs(),
                "a 3.6 m rotor frees its bearings before it can charge: " + s);
    }

    @Test
    void cogging_raises_the_starting_wind_by_the_square_root_of_the_torque_ratio() {
        WindMatchRequest axial = MatchFixtures.windRequest(MatchFixtures.rotor());
        WindStart air = WindMatching.match(axial).starting();
        WindStart slotted = WindAssessment.starting(coilwright.machine.AlternatorModel.build(SampleDesigns.radial12V()),
                axial.rotor(), axial.site().effectiveAirDensityKgM3(), OptionalDouble.of(air.chargingStartsAtMs()),
                axial.wind().distribution());
        assertTrue(slotted.coggingPeakNm() > 0);
        // the standstill torque grows as the wind squared (WindStarting)
        double ratio = (slotted.coggingPeakNm() + slotted.breakawayFrictionNm()) / air.breakawayFrictionNm();
        assertEquals(air.startsTurningAtMs() * Math.sqrt(ratio), slotted.startsTurningAtMs(), 1e-9);
    }

    @Test
    void the_hard_start_wind_is_exceeded_a_tenth_of_the_time() {
        WindMatchRequest r = MatchFixtures.windRequest(MatchFixtures.rotor());
        WindStart s = WindMatching.match(r).starting();
        assertEquals(1 - WindAssessment.HARD_START_EXCEEDANCE, r.wind().distribution().cdf(s.hardStartWindMs()), 1e-4);
    }

    @Test
    void the_winding_temperature_is_solved_at_the_top_of_the_matched_curve() {
        WindMatchResult r = WindMatching.match(MatchFixtures.windRequest(MatchFixtures.rotor()));
        WindMatchPoint top = r.points().stream()
                .max(java.util.Comparator.comparingDouble(WindMatchPoint::powerToBatteryW)).orElseThrow();
        LossPoint heat = r.peakHeat();
        assertEquals(top.alternatorSpeedRpm(), heat.speedRpm(), 1e-12);
        assertTrue(heat.windingMeanC() > 25, "a charging winding is above ambient");
        assertEquals(heat.shaftPowerW(), heat.powerToLoadW() + heat.totalLossW(), 1e-6 * heat.shaftPowerW());
    }
}
