package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A penstock pipe.
 *
 * @param lengthM         pipe length, m, > 0 and <= 20000
 * @param innerDiameterM  inner diameter, m, > 0 and <= 5
 * @param roughnessM      equivalent sand roughness, m, 0 to 0.01, and at most 5 % of the diameter (the Moody chart's range)
 * @param hazenWilliamsC  Hazen-Williams coefficient for the cross-check, 60 to 160
 * @param sumMinorLossK   sum of fitting loss coefficients (intake, bends, valves), 0 to 100
 */
public record PenstockSpec(double lengthM, double innerDiameterM, double roughnessM, double hazenWilliamsC,
                           double sumMinorLossK) {
    public PenstockSpec {
        Checks c = new Checks();
        c.rangeExclusiveMin("lengthM", lengthM, 0.0, 20_000.0);
        c.rangeExclusiveMin("innerDiameterM", innerDiameterM, 0.0, 5.0);
        c.range("roughnessM", roughnessM, 0.0, 0.01);
        c.range("hazenWilliamsC", hazenWilliamsC, 60.0, 160.0);
        c.range("sumMinorLossK", sumMinorLossK, 0.0, 100.0);
        if (!c.hasErrors()) {
            c.require(roughnessM <= 0.05 * innerDiameterM, "roughnessM", roughnessM,
                    "must be <= 0.05 x innerDiameterM = " + Checks.fmt(0.05 * innerDiameterM)
                            + " (relative roughness beyond the Moody chart)", "<= 0.05 x innerDiameterM");
        }
        c.throwIfAny();
    }

    /** A pipe of a listed material with its typical roughness and Hazen-Williams C. */
    public static PenstockSpec of(double lengthM, double innerDiameterM, PipeMaterial material, double sumMinorLossK) {
        new Checks().present("material", material).throwIfAny();
        return new PenstockSpec(lengthM, innerDiameterM, material.roughnessM(), material.hazenWilliamsC(),
                sumMinorLossK);
    }

    /** Roughness over diameter. */
    public double relativeRoughness() {
        return roughnessM / innerDiameterM;
    }

    /** Bore area, m^2. */
    public double boreAreaM2() {
        return Math.PI / 4.0 * innerDiameterM * innerDiameterM;
    }
}
