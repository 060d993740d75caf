package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * The wind speed at which a wind rotor held still starts to turn: its standstill torque
 * 0.5 rho A R U^2 Cq0 equals the torque that holds it, the alternator's peak cogging torque plus the break-away
 * friction of its bearings, carried back to the rotor shaft through the drive (times the drive ratio, divided by
 * the drivetrain efficiency). This is separate from the wind speed at which charging begins, which needs the
 * rotor to reach the alternator's cut-in speed under load.
 */
public final class WindStarting {
    private WindStarting() {
    }

    /**
     * @param rotor                        the wind rotor (swept area, radius, drive ratio, drivetrain efficiency)
     * @param airDensityKgM3               air density, kg/m^3, &gt; 0 and &lt;= 2
     * @param startingTorqueCoefficient    Cq0 (see {@link StartingTorque}), &gt; 0
     * @param holdingTorqueAtAlternatorNm  peak cogging plus break-away friction at the alternator shaft, N m, &gt;= 0
     * @return the starting wind speed, m/s (0 when nothing holds the rotor)
     */
    public static double startsTurningAtMs(WindRotor rotor, double airDensityKgM3, double startingTorqueCoefficient,
                                           double holdingTorqueAtAlternatorNm) {
        new Checks().present("rotor", rotor).rangeExclusiveMin("airDensityKgM3", airDensityKgM3, 0, 2)
                .positive("startingTorqueCoefficient", startingTorqueCoefficient)
                .nonNegative("holdingTorqueAtAlternatorNm", holdingTorqueAtAlternatorNm).throwIfAny();
        double atRotor = holdingTorqueAtAlternatorNm * rotor.driveRatio() / rotor.drivetrainEfficiency();
        return Math.sqrt(atRotor / (0.5 * airDensityKgM3 * rotor.sweptAreaM2() * rotor.radiusM()
                * startingTorqueCoefficient));
    }
}
