package coilwright.sizing;

import coilwright.magnet.MagnetMaterial;
import coilwright.validation.Checks;

/**
 * The builder's prices per kilogram, in any one currency, for the material cost.
 *
 * @param copperPerKg           magnet wire, 0 to 10 000 per kg
 * @param rareEarthMagnetPerKg  sintered NdFeB magnets, 0 to 10 000 per kg
 * @param ferriteMagnetPerKg    ferrite magnets, 0 to 10 000 per kg
 */
public record MaterialPrices(double copperPerKg, double rareEarthMagnetPerKg, double ferriteMagnetPerKg) {
    public MaterialPrices {
        new Checks().range("copperPerKg", copperPerKg, 0, 10_000)
                .range("rareEarthMagnetPerKg", rareEarthMagnetPerKg, 0, 10_000)
                .range("ferriteMagnetPerKg", ferriteMagnetPerKg, 0, 10_000).throwIfAny();
    }

    /** No prices known: every cost is 0. */
    public static MaterialPrices none() {
        return new MaterialPrices(0, 0, 0);
    }

    /** True when any price is set. */
    public boolean known() {
        return copperPerKg > 0 || rareEarthMagnetPerKg > 0 || ferriteMagnetPerKg > 0;
    }

    /** Price per kg of a magnet material. */
    public double magnetPerKg(MagnetMaterial material) {
        return material == MagnetMaterial.FERRITE ? ferriteMagnetPerKg : rareEarthMagnetPerKg;
    }
}
