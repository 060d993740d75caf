package coilwright.losses;

import coilwright.validation.Checks;
import coilwright.winding.Winding;

/**
 * An estimate of the zero-sequence inductance L0 of a three-phase winding as a share of its phase (synchronous)
 * inductance, with the band it is uncertain within. Zero-sequence currents (equal in all three phases, as the
 * third-harmonic current circulating in a delta is) see L0 = L_self + 2 M, the phase inductance
 * L_ph = L_self - M. In a distributed winding M is about -L_m/2, so L0 is little more than the leakage; in a
 * tooth-coil winding the phases hardly couple and L0 approaches L_ph; in an air-cored winding the coupling is weak
 * too. The shares are from memory of machine-design texts (e.g. Pyrhonen et al. 2008, ch. 4) and carry the band.
 *
 * @param ratio     L0 / L_ph used
 * @param lowRatio  lower end of the plausible band
 * @param highRatio upper end of the plausible band
 * @param basis     why this estimate, in words
 */
public record ZeroSequenceInductance(double ratio, double lowRatio, double highRatio, String basis) {
    public ZeroSequenceInductance {
        new Checks().range("ratio", ratio, 0.01, 2).range("lowRatio", lowRatio, 0.01, 2)
                .range("highRatio", highRatio, 0.01, 2).throwIfAny();
        new Checks().require(lowRatio <= ratio && ratio <= highRatio, "ratio", ratio,
                "must lie within lowRatio..highRatio", Checks.fmt(lowRatio) + " to " + Checks.fmt(highRatio))
                .throwIfAny();
    }

    /** Air-cored coils: L0 about L_ph (0.7 to 1.2; from memory). */
    public static ZeroSequenceInductance airCored() {
        return new ZeroSequenceInductance(1.0, 0.7, 1.2, "air-cored coils couple weakly: L0 near the phase inductance");
    }

    /** Tooth coils (concentrated, pitch one slot): L0 about 0.8 L_ph (0.5 to 1.0; from memory). */
    public static ZeroSequenceInductance toothCoils() {
        return new ZeroSequenceInductance(0.8, 0.5, 1.0, "tooth coils couple weakly: L0 a large share of L_ph");
    }

    /** Distributed windings: L0 about 0.2 L_ph (0.1 to 0.5; from memory). */
    public static ZeroSequenceInductance distributed() {
        return new ZeroSequenceInductance(0.2, 0.1, 0.5, "distributed winding: zero-sequence fields largely cancel, "
                + "L0 is mostly leakage");
    }

    /** The estimate for a winding: air-cored, tooth-coil or distributed. */
    public static ZeroSequenceInductance forWinding(Winding winding, boolean airCored) {
        if (airCored) {
            return airCored();
        }
        return winding.toothCoils() ? toothCoils() : distributed();
    }

    /**
     * The user's own measurement of L0 (e.g. the three phases in series, fed from one AC source: L0 = L_series / 3).
     */
    public static ZeroSequenceInductance measured(double zeroSequenceInductanceH, double phaseInductanceH) {
        new Checks().positive("zeroSequenceInductanceH", zeroSequenceInductanceH).positive("phaseInductanceH",
                phaseInductanceH).throwIfAny();
        double r = zeroSequenceInductanceH / phaseInductanceH;
        return new ZeroSequenceInductance(r, r, r, "measured");
    }
}
