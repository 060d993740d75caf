package coilwright.magnet;

/** Permanent-magnet material families with the mass density used for magnet mass. */
public enum MagnetMaterial {
    /** Sintered neodymium-iron-boron. Density 7500 kg/m^3 (manufacturers' data sheets, common practice). */
    NDFEB_SINTERED(7500.0),
    /** Sintered hard (strontium/barium) ferrite. Density 4900 kg/m^3 (manufacturers' data sheets, common practice). */
    FERRITE(4900.0);

    private final double densityKgPerM3;

    MagnetMaterial(double densityKgPerM3) {
        this.densityKgPerM3 = densityKgPerM3;
    }

    /** Mass density in kg/m^3. */
    public double densityKgPerM3() {
        return densityKgPerM3;
    }
}
