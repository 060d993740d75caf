package coilwright.losses;

import coilwright.validation.Checks;

/**
 * Stator iron loss at one speed: the Bertotti separation of {@link ElectricalSteel} applied to teeth and yoke at
 * their peak flux densities, with the flux taken sinusoidal at the electrical frequency f = p n / 60 and the total
 * multiplied by the core's build factor (which also stands for the extra eddy loss of the trapezoidal tooth flux).
 * Flux densities above {@link ElectricalSteel#MAX_FLUX_DENSITY_T} are taken at that value.
 *
 * @param frequencyHz  electrical frequency, Hz
 * @param hysteresisW  hysteresis part, W (build factor included)
 * @param eddyW        classical eddy-current part, W
 * @param excessW      excess part, W
 * @param toothW       loss in the teeth, W
 * @param yokeW        loss in the yoke, W
 * @param totalW       total stator iron loss, W (hysteresis + eddy + excess = teeth + yoke)
 */
public record IronLoss(double frequencyHz, double hysteresisW, double eddyW, double excessW, double toothW,
                       double yokeW, double totalW) {
    /** Highest electrical frequency the loss separation is used at, Hz. */
    public static final double MAX_FREQUENCY_HZ = 5000;

    /**
     * Iron loss at a speed.
     *
     * @param flux      teeth and yoke flux densities and masses
     * @param core      steel grade and build factor
     * @param poles     number of poles 2p
     * @param speedRpm  speed, rpm, &gt;= 0 (0 gives no loss)
     */
    public static IronLoss at(CoreFlux flux, StatorCore core, int poles, double speedRpm) {
        new Checks().present("flux", flux).present("core", core).intRange("poles", poles, 2, 400)
                .range("speedRpm", speedRpm, 0, 100_000).throwIfAny();
        double f = poles / 2.0 * speedRpm / 60.0;
        new Checks().require(f <= MAX_FREQUENCY_HZ, "speedRpm", speedRpm, String.format(java.util.Locale.ROOT,
                "gives %.0f Hz with %d poles; the iron-loss model is used up to %.0f Hz", f, poles, MAX_FREQUENCY_HZ),
                "<= " + Checks.fmt(MAX_FREQUENCY_HZ * 120 / poles)).throwIfAny();
        ElectricalSteel steel = core.steel();
        double bMax = ElectricalSteel.MAX_FLUX_DENSITY_T;
        ElectricalSteel.SpecificLoss tooth = steel.specificLoss(Math.min(flux.toothMeanT(), bMax), f);
        ElectricalSteel.SpecificLoss yoke = steel.specificLoss(Math.min(flux.yokeT(), bMax), f);
        double kb = core.buildFactor();
        double mt = flux.toothMassKg() * kb;
        double my = flux.yokeMassKg() * kb;
        double h = tooth.hysteresisWPerKg() * mt + yoke.hysteresisWPerKg() * my;
        double e = tooth.eddyWPerKg() * mt + yoke.eddyWPerKg() * my;
        double x = tooth.excessWPerKg() * mt + yoke.excessWPerKg() * my;
        return new IronLoss(f, h, e, x, tooth.totalWPerKg() * mt, yoke.totalWPerKg() * my, h + e + x);
    }
}
