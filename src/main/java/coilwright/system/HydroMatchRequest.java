package coilwright.system;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.turbine.HydroSite;
import coilwright.turbine.PenstockSpec;
import coilwright.validation.Checks;

/**
 * A micro-hydro system to match: site, penstock, runner, drive, alternator and load.
 *
 * @param alternator            the machine
 * @param load                  its battery (through a rectifier) or resistors
 * @param site                  gross head, design flow and optional flow-duration curve; the design flow at most
 *                              10 m^3/s and the gross head within the runner kind's limit
 * @param penstock              the pipe
 * @param runner                the runner
 * @param driveRatio            alternator speed / runner speed, > 0 and <= 20 (1 for direct drive)
 * @param drivetrainEfficiency  belt or coupling efficiency, 0.5 to 1
 * @param waterTempC            water temperature for the pipe friction, C, 0 to 40
 */
public record HydroMatchRequest(AlternatorSpec alternator, Load load, HydroSite site, PenstockSpec penstock,
                                RunnerDesign runner, double driveRatio, double drivetrainEfficiency, double waterTempC) {
    public HydroMatchRequest {
        Checks c = new Checks().present("alternator", alternator).present("load", load).present("site", site)
                .present("penstock", penstock).present("runner", runner)
                .rangeExclusiveMin("driveRatio", driveRatio, 0.0, 20.0)
                .range("drivetrainEfficiency", drivetrainEfficiency, 0.5, 1.0)
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
}
