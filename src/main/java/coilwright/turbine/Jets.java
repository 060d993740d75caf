package coilwright.turbine;

/** Shared arithmetic of jet-driven runners. */
final class Jets {
    private Jets() {
    }

    /** Jet velocity Cv sqrt(2 g H), m/s (Torricelli with a nozzle velocity coefficient). */
    static double jetVelocityMs(double nozzleVelocityCoefficient, double netHeadM) {
        return nozzleVelocityCoefficient * Math.sqrt(2.0 * WaterProperties.GRAVITY_MS2 * netHeadM);
    }

    /** Round jet (nozzle) diameter carrying a flow at a velocity, m. */
    static double jetDiameterM(double flowPerJetM3s, double jetVelocityMs) {
        return Math.sqrt(4.0 * flowPerJetM3s / (Math.PI * jetVelocityMs));
    }

    /** Shaft speed for a peripheral speed on a diameter, rpm. */
    static double speedRpm(double peripheralSpeedMs, double diameterM) {
        return 60.0 * peripheralSpeedMs / (Math.PI * diameterM);
    }

    /** Diameter giving a peripheral speed at a shaft speed, m. */
    static double diameterM(double peripheralSpeedMs, double speedRpm) {
        return 60.0 * peripheralSpeedMs / (Math.PI * speedRpm);
    }
}
