package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A small hydro runner working at a net head and flow, with an idealised straight torque-speed line:
 * <pre>  T(n) = T0 (1 - n / n_runaway),   P(n) = T(n) * omega</pre>
 * For an impulse runner the force of the jet on the buckets is proportional to the relative speed
 * (jet speed minus bucket speed), so torque falls linearly to zero at runaway and power is a parabola
 * peaking at half the runaway speed (ideal impulse-turbine theory; e.g. Dixon &amp; Hall, "Fluid Mechanics
 * and Thermodynamics of Turbomachinery", ch. 9). Here the runaway speed is set to twice the optimum speed
 * and T0 so that the peak power equals rho g Q H_net eta. For a Pelton with an optimum bucket-to-jet
 * speed ratio of 0.46 this gives runaway at 0.92 of jet speed, inside the 0.9 to 1.0 seen in practice.
 * Above runaway the model gives no torque (the braking region is not modelled).
 */
public sealed interface HydroRunner permits ImpulseRunner, TurgoRunner, CrossflowRunner {

    /** Net head at the runner, m. */
    double netHeadM();

    /** Flow through the runner, m^3/s. */
    double flowM3s();

    /** Runner efficiency at its optimum speed, 0 to 1. */
    double peakEfficiency();

    /** Runner speed of peak power, rpm. */
    double optimumSpeedRpm();

    /** Water power rho g Q H_net, W (rho = 1000 kg/m^3, g = 9.80665 m/s^2). */
    default double hydraulicPowerW() {
        return WaterProperties.NOMINAL_DENSITY_KG_M3 * WaterProperties.GRAVITY_MS2 * flowM3s() * netHeadM();
    }

    /** Shaft power at the optimum speed, rho g Q H_net eta, W. */
    default double peakShaftPowerW() {
        return hydraulicPowerW() * peakEfficiency();
    }

    /** Unloaded runaway speed, rpm: twice the optimum on the straight torque line. */
    default double runawaySpeedRpm() {
        return 2.0 * optimumSpeedRpm();
    }

    /** Torque with the runner held still, N m: 2 P_peak / omega_opt. */
    default double stallTorqueNm() {
        return 2.0 * peakShaftPowerW() / (optimumSpeedRpm() * Math.PI / 30.0);
    }

    /**
     * Shaft torque at a runner speed, N m; 0 at and above runaway.
     *
     * @param runnerSpeedRpm runner speed, rpm, >= 0
     */
    default double torqueNm(double runnerSpeedRpm) {
        new Checks().nonNegative("runnerSpeedRpm", runnerSpeedRpm).throwIfAny();
        double share = runnerSpeedRpm / runawaySpeedRpm();
        return share >= 1.0 ? 0.0 : stallTorqueNm() * (1.0 - share);
    }

    /**
     * Shaft power at a runner speed, W; the peak {@link #peakShaftPowerW()} at {@link #optimumSpeedRpm()}.
     *
     * @param runnerSpeedRpm runner speed, rpm, >= 0
     */
    default double powerW(double runnerSpeedRpm) {
        return torqueNm(runnerSpeedRpm) * runnerSpeedRpm * Math.PI / 30.0;
    }
}
