package coilwright.web.match;

import coilwright.system.RunnerDesign;
import coilwright.system.RunnerKind;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroSite;
import coilwright.turbine.PenstockSpec;
import coilwright.turbine.PipeMaterial;

import java.util.List;

/**
 * The hydro match page's form (the alternator is the design the page carries): the site, penstock, runner and drive.
 */
public record HydroPageForm(HydroSite site, PenstockSpec penstock, RunnerDesign runner,
                            double driveRatio, double drivetrainEfficiency, double waterTempC) {
    /** An invented 28 m head stream of 12 L/s in 150 m of 90 mm HDPE, an impulse runner sized for 600 rpm. */
    static HydroPageForm defaults() {
        return new HydroPageForm(new HydroSite(28.0, 0.012, List.of(new FlowDurationPoint(0.03, 0),
                new FlowDurationPoint(0.012, 50), new FlowDurationPoint(0.006, 90), new FlowDurationPoint(0.004, 100))),
                PenstockSpec.of(150, 0.09, PipeMaterial.HDPE, 2.5), new RunnerDesign(RunnerKind.IMPULSE, 2, 0, 600, 0),
                1.0, 0.95, 10.0);
    }
}
