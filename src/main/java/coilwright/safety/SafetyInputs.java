package coilwright.safety;

import coilwright.validation.Checks;

/**
 * What the caution rules need to know about a design, in SI units.
 *
 * @param openCircuitLineRmsV      open-circuit line-to-line EMF (rms) at {@code checkSpeedRpm}
 * @param checkSpeedRpm            the speed the open-circuit voltage is checked at (the user's maximum,
 *                                 the turbine's runaway speed, or twice rated when neither is known)
 * @param checkSpeedSource         where that speed comes from, in words (shown to the user)
 * @param batteryCharging          true when the alternator charges a battery through a rectifier
 * @param batteryNominalV          the battery's nominal voltage (0 for a resistive load)
 * @param leadAcid                 true for vented or sealed lead-acid batteries (hydrogen when charging)
 * @param maxOutputPowerW          the largest output in the evaluated range (for diversion-load sizing)
 * @param maxDcCurrentA            the largest DC current in the evaluated range (0 for a resistive load)
 * @param magnetMassKg             total magnet mass on the rotor(s)
 * @param rareEarthMagnets         true for NdFeB (strong attraction, brittle, pinch hazard)
 * @param deltaConnected           true when the phases are connected in delta
 * @param thirdHarmonicEmfRatio    third-harmonic phase EMF over the fundamental (0 when unknown)
 * @param magnetOverTemperature    true when the magnet temperature is above its grade's working limit
 * @param windingOverTemperature   true when the winding temperature is above its insulation class
 */
public record SafetyInputs(
        double openCircuitLineRmsV,
        double checkSpeedRpm,
        String checkSpeedSource,
        boolean batteryCharging,
        double batteryNominalV,
        boolean leadAcid,
        double maxOutputPowerW,
        double maxDcCurrentA,
        double magnetMassKg,
        boolean rareEarthMagnets,
        boolean deltaConnected,
        double thirdHarmonicEmfRatio,
        boolean magnetOverTemperature,
        boolean windingOverTemperature) {

    public SafetyInputs {
        new Checks()
                .nonNegative("openCircuitLineRmsV", openCircuitLineRmsV)
                .nonNegative("checkSpeedRpm", checkSpeedRpm)
                .nonNegative("batteryNominalV", batteryNominalV)
                .nonNegative("maxOutputPowerW", maxOutputPowerW)
                .nonNegative("maxDcCurrentA", maxDcCurrentA)
                .nonNegative("magnetMassKg", magnetMassKg)
                .range("thirdHarmonicEmfRatio", thirdHarmonicEmfRatio, 0, 1)
                .throwIfAny();
        checkSpeedSource = checkSpeedSource == null ? "" : checkSpeedSource;
    }
}
