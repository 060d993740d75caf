package coilwright.sizing;

/** What the ranking puts first. */
public enum Objective {
    /** Most energy into the battery per year, kWh (wind, or hydro with a flow-duration curve). */
    ANNUAL_ENERGY(true),
    /** Most power into the battery at the rated point, W. */
    OUTPUT_AT_RATED(true),
    /** Highest efficiency at the rated point (battery power over shaft power). */
    EFFICIENCY_AT_RATED(true),
    /** Least copper plus magnet mass, kg. */
    ACTIVE_MASS(false),
    /** Least material cost of copper and magnets at the prices given. */
    MATERIAL_COST(false);

    private final boolean maximise;

    Objective(boolean maximise) {
        this.maximise = maximise;
    }

    /** True when more is better. */
    public boolean maximise() {
        return maximise;
    }
}
