package coilwright.sizing;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.system.HydroMatchRequest;
import coilwright.system.RunnerDesign;
import coilwright.turbine.HydroSite;
import coilwright.turbine.PenstockSpec;
import coilwright.validation.Checks;

/**
 * A hydro site and runner, as on the hydro match. The matched point at the design flow is "rated".
 *
 * @param site                  gross head, design flow (at most 10 m^3/s) and optional flow-duration curve
 * @param penstock              the pipe
 * @param runner                the runner (kind, jets, diameter or target speed)
 * @param driveRatio            alternator speed / runner speed, &gt; 0 and &lt;= 20
 * @param drivetrainEfficiency  belt or coupling efficiency, &gt; 0 and &lt;= 1
 * @param waterTempC            water temperature, C, 0 to 40
 */
public record HydroDrive(HydroSite site, PenstockSpec penstock, RunnerDesign runner, double driveRatio,
                         double drivetrainEfficiency, double waterTempC) implements Drive {
    public HydroDrive {
        Checks c = new Checks().present("site", site).present("penstock", penstock).present("runner", runner)
                .rangeExclusiveMin("driveRatio", driveRatio, 0.0, 20.0)
                .rangeExclusiveMin("drivetrainEfficiency", drivetrainEfficiency, 0.0, 1.0)
                .range("waterTempC", waterTempC, 0.0, 40.0);
        if (site != null && runner != null) {
            c.require(site.grossHeadM() <= runner.kind().maxHeadM(), "site.grossHeadM", site.grossHeadM(),
                    "must be <= " + Checks.fmt(runner.kind().maxHeadM()) + " m for a " + runner.kind() + " runner",
                    "<= " + Checks.fmt(runner.kind().maxHeadM()));
        }
        if (site != null) {
            c.require(site.designFlowM3s() <= 10.0, "site.designFlowM3s", site.designFlowM3s(),
                    "must be <= 10 m^3/s (small hydro runner models)", "> 0 and <= 10");
        }
        c.throwIfAny();
    }

    /** The hydro match of one alternator with this drive. */
    public HydroMatchRequest matchRequest(AlternatorSpec alternator, Load load) {
        return new HydroMatchRequest(alternator, load, site, penstock, runner, driveRatio, drivetrainEfficiency,
                waterTempC);
    }
}
