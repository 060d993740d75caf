package coilwright.web.match;

import coilwright.system.RunnerDesign;
import coilwright.system.RunnerKind;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroSite;
import coilwright.turbine.PenstockSpec;
import coilwright.turbine.PipeMaterial;
import coilwright.validation.Checks;

import java.util.List;

/**
 * The hydro match page's form: an example alternator design by its slug, the site, penstock, runner and drive.
 *
 * @param example the example design's slug (the page checks it against the example catalogue)
 */
public record HydroPageForm(String example, HydroSite site, PenstockSpec penstock, RunnerDesign runner,
                            double driveRatio, double drivetrainEfficiency, double waterTempC) {
    public HydroPageForm {
        new Checks().present("example", example)
                .throwIfAny();
    }

    /** An invented 28 m head stream of 12 L/s in 150 m of 90 mm HDPE, an impulse runner sized for 600 rpm. */
    static HydroPageForm defaults(String example) {
        return new HydroPageForm(example, new HydroSite(28.0, 0.012, List.of(new FlowDurationPoint(0.03, 0),
                new FlowDurationPoint(0.012, 50), new FlowDurationPoint(0.006, 90), new FlowDurationPoint(0.004, 100))),
                PenstockSpec.of(150, 0.09, PipeMaterial.HDPE, 2.5), new RunnerDesign(RunnerKind.IMPULSE, 2, 0, 600, 0),
                1.0, 0.95, 10.0);
    }
}
