package coilwright.sizing;

/**
 * The objective as a score (higher is better) and the two axes of the Pareto front, from the closed forms (bounds)
 * and from the full model (values).
 */
final class Scoring {
    /** Relative widening of every closed-form bound: covers the rounding of the closed forms and the full model's
     *  own solver tolerance (far smaller), so a bound is never a hair under the value it bounds. */
    static final double WIDENING = 1e-6;

    private final Objective objective;
    private final DriveModel drive;
    private final LoadConstants lc;
    private final MaterialPrices prices;
    private final boolean byCost;

    Scoring(Objective objective, DriveModel drive, LoadConstants lc, MaterialPrices prices) {
        this.objective = objective;
        this.drive = drive;
        this.lc = lc;
        this.prices = prices;
        this.byCost = prices.known();
    }

    /** Adds a screened candidate to the survivors with its bounds and estimate, each worked out once. */
    void addSurvivor(ScreenValues s, Survivors out) {
        double value = frontValueBound(s);
        boolean same = objective == Objective.ANNUAL_ENERGY || objective == Objective.OUTPUT_AT_RATED
                && !drive.hasEnergy();
        double score = same ? value : scoreBound(s);
        out.add(s.index, score, scoreEstimate(s), value, frontCost(s));
    }

    /** An upper bound of the score of a screened candidate. */
    double scoreBound(ScreenValues s) {
        double v = switch (objective) {
            case ANNUAL_ENERGY -> drive.energyBoundKWh(s);
            case OUTPUT_AT_RATED -> drive.ratedPowerBoundW(s);
            case EFFICIENCY_AT_RATED -> drive.ratedEfficiencyBound(s);
            case ACTIVE_MASS -> -s.activeMassKg();
            case MATERIAL_COST -> -s.cost(prices);
        };
        return widen(v);
    }

    /**
     * The order in which screened candidates are refined, higher first: an estimate of the score where the bound is
     * loose (energy, output), the bound itself otherwise. It changes only how soon good designs are found.
     */
    double scoreEstimate(ScreenValues s) {
        return switch (objective) {
            case ANNUAL_ENERGY -> drive.energyEstimateKWh(s);
            case OUTPUT_AT_RATED -> drive.ratedPowerEstimateW(s);
            default -> scoreBound(s);
        };
    }

    /** The score under the full model. */
    double score(FullEvaluation f) {
        return switch (objective) {
            case ANNUAL_ENERGY -> f.annualEnergyKWh();
            case OUTPUT_AT_RATED -> f.ratedPowerW();
            case EFFICIENCY_AT_RATED -> f.ratedEfficiency();
            case ACTIVE_MASS -> -f.activeMassKg();
            case MATERIAL_COST -> -f.cost(prices);
        };
    }

    /** An upper bound of the front's value (annual energy, or output at rated) of a screened candidate. */
    double frontValueBound(ScreenValues s) {
        return widen(drive.hasEnergy() ? drive.energyBoundKWh(s) : drive.ratedPowerBoundW(s));
    }

    /** The front's value under the full model. */
    double frontValue(FullEvaluation f) {
        return drive.hasEnergy() ? f.annualEnergyKWh() : f.ratedPowerW();
    }

    /** The front's cost axis of a screened candidate (exact: the same closed forms as the full model). */
    double frontCost(ScreenValues s) {
        return byCost ? s.cost(prices) : s.activeMassKg();
    }

    /** The front's cost axis under the full model. */
    double frontCost(FullEvaluation f) {
        return byCost ? f.cost(prices) : f.activeMassKg();
    }

    String frontValueName() {
        return drive.hasEnergy() ? "annualEnergyKWh" : "ratedPowerW";
    }

    String frontCostName() {
        return byCost ? "materialCost" : "activeMassKg";
    }

    private static double widen(double v) {
        return v + Math.abs(v) * WIDENING + 1e-12;
    }
}
