package coilwright.web.match;

import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindRotor;
import coilwright.validation.Checks;
import coilwright.validation.InvalidInputException;

/**
 * The wind-rotor fields of the match page (a parametric Cp curve; the API also takes a Cp table). Validated with the
 * core records' own checks, under the same field names.
 */
public record RotorFields(double diameterM, int bladeCount, double cpMax, double tipSpeedRatioOpt,
                          double maxRotorSpeedRpm, double driveRatio, double drivetrainEfficiency) {
    public RotorFields {
        Checks c = new Checks();
        try {
            new ParametricCp(cpMax, tipSpeedRatioOpt);
        } catch (InvalidInputException e) {
            c.nested("", e);
        }
        try {
            new WindRotor(diameterM, bladeCount, new ParametricCp(0.4, 7), maxRotorSpeedRpm, driveRatio,
                    drivetrainEfficiency);
        } catch (InvalidInputException e) {
            c.nested("", e);
        }
        c.throwIfAny();
    }

    /** A 2.4 m three-blade rotor, Cp 0.40 at tip-speed ratio 6.5, governed at 600 rpm, direct drive (the axial example's rotor). */
    static RotorFields defaults() {
        return new RotorFields(2.4, 3, 0.40, 6.5, 600, 1.0, 1.0);
    }

    WindRotor toRotor() {
        return new WindRotor(diameterM, bladeCount, new ParametricCp(cpMax, tipSpeedRatioOpt), maxRotorSpeedRpm,
                driveRatio, drivetrainEfficiency);
    }
}
