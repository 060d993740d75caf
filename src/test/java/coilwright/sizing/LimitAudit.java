package coilwright.sizing;

import coilwright.conductor.FillCheck;
import coilwright.load.BatteryLoad;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.HeatAssessment;
import coilwright.system.HydroMatchResult;
import coilwright.system.HydroMatcher;
import coilwright.system.SpeedPoint;
import coilwright.system.WindMatchResult;
import coilwright.system.WindMatching;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Checks a proposed design against the request's limits through the public system API only (evaluation, wind and
 * hydro matching), independently of the search's own limit classes.
 */
final class LimitAudit {
    private LimitAudit() {
    }

    /** Every limit the result says it applied, checked on the design; the list of breaches is returned. */
    static List<String> breaches(SizingRequest req, SizingResult result, SizedDesign d) {
        AlternatorSpec spec = d.alternator();
        Alternator alt = AlternatorModel.build(spec);
        BatteryLoad load = req.load();
        double fill = alt.fill().basis() == FillCheck.Basis.COPPER_FILL ? alt.fill().copperFill() : alt.fill().wireFill();
        double voc;
        SpeedPoint rated;
        double cutInRpm = AlternatorEvaluator.closedFormCutInRpm(alt, load);
        double cutInWind = 0;
        boolean charges;
        if (req.drive() instanceof WindDrive w) {
            // the search's full model matches without the running drag for now (WindDriveModel): audit that model
            WindMatchResult r = WindMatching.matchWithoutDrag(alt, w.matchRequest(spec, load));
            voc = r.openCircuitLineRmsVAtCheckSpeed();
            rated = AlternatorEvaluator.point(alt, load, r.points().get(w.ratedRow()).alternatorSpeedRpm());
            cutInWind = r.cutInWindSpeedMs().orElse(Double.POSITIVE_INFINITY);
            charges = r.cutInWindSpeedMs().isPresent();
            assertEquals(r.annualEnergy().annualEnergyKWh(), d.figures().annualEnergyKWh().orElseThrow(), 1e-9);
        } else if (req.drive() instanceof HydroDrive h) {
            HydroMatchResult r = HydroMatcher.match(h.matchRequest(spec, load));
            voc = r.openCircuitLineRmsVAtRunaway();
            rated = AlternatorEvaluator.point(alt, load, r.matched().alternatorSpeedRpm());
            charges = r.matched().powerToBatteryW() > 0;
        } else {
            SpeedTargets t = (SpeedTargets) req.drive();
            AlternatorEvaluation e = AlternatorEvaluator.evaluate(req.evaluationRequest(spec, t.ratedSpeedRpm(),
                    t.effectiveMaxSpeedRpm()));
            voc = e.openCircuitLineRmsVAtMaxSpeed();
            rated = e.rated();
            charges = rated.powerToLoadW() > 0;
        }
        List<String> out = new ArrayList<>();
        for (AppliedLimit l : result.limits()) {
            double figure = switch (l.limit()) {
                case "fill" -> fill;
                case "openCircuitVoltage" -> voc;
                case "charging" -> charges ? 0 : Double.POSITIVE_INFINITY;
                case "cutInWindSpeed" -> cutInWind;
                case "cutInSpeed" -> cutInRpm;
                case "ratedPower" -> -rated.powerToLoadW();
                case "currentDensity" -> rated.currentDensityAPerMm2();
                case "efficiency" -> -rated.efficiency();
                case "windingTemperature" -> HeatAssessment.assess(alt, load, List.of(rated), rated,
                        rated.speedRpm()).rated().windingHotSpotC();
                case "cogging" -> 100 * HeatAssessment.cogging(alt).peakNm() / rated.shaftTorqueNm();
                default -> throw new AssertionError("unknown limit " + l.limit());
            };
            double allowed = l.limit().equals("ratedPower") || l.limit().equals("efficiency") ? -l.allowed()
                    : l.limit().equals("charging") ? 0 : l.allowed();
            if (figure > allowed) {
                out.add(l.limit() + ": " + figure + " against " + allowed);
            }
        }
        assertTrue(rated.speedRpm() > 0, "a rated point");
        return out;
    }
}
