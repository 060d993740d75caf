package coilwright.sizing;

import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.machine.AlternatorSpec;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.validation.Checks;

/**
 * Design from requirements: the drive, the battery load, what can be built, the winding choices, the limits and
 * what to rank by.
 *
 * @param drive               wind rotor and site, hydro site and runner, or plain speed targets
 * @param load                battery bank, three-phase bridge rectifier and cables
 * @param build               axial air-cored or radial slotted, with size limits and magnets
 * @param winding             turns, wire, connections, parallel paths, winding-factor floor, cooling
 * @param limits              what every design must meet
 * @param objective           what to rank by
 * @param prices              prices per kg for the material cost (all 0 when unknown)
 * @param resultCount         designs to return, 1 to 50
 * @param maxFullEvaluations  most candidates refined with the full model, 10 to 100 000; when the search stops there
 *                            the result says so ({@link SizingResult#provenBest()})
 */
public record SizingRequest(Drive drive, BatteryLoad load, Build build, WindingChoices winding, Limits limits,
                            Objective objective, MaterialPrices prices, int resultCount, int maxFullEvaluations) {
    public SizingRequest {
        Checks c = new Checks().present("drive", drive).present("load", load).present("build", build)
                .present("winding", winding).present("limits", limits).present("objective", objective)
                .present("prices", prices).intRange("resultCount", resultCount, 1, 50)
                .intRange("maxFullEvaluations", maxFullEvaluations, 10, 100_000);
        c.throwIfAny();
        c.require(load.rectifier().type() == BridgeType.THREE_PHASE_BRIDGE, "load.rectifier.type",
                load.rectifier().type(), "must be THREE_PHASE_BRIDGE: the search sizes three-phase machines",
                "THREE_PHASE_BRIDGE");
        boolean energy = drive instanceof WindDrive || drive instanceof HydroDrive h && h.site().hasFlowDuration();
        c.require(objective != Objective.ANNUAL_ENERGY || energy, "objective", objective,
                "annual energy needs a wind drive or a hydro site with a flow-duration curve; rank by "
                        + "OUTPUT_AT_RATED instead", "OUTPUT_AT_RATED, EFFICIENCY_AT_RATED, ACTIVE_MASS, MATERIAL_COST");
        c.require(objective != Objective.MATERIAL_COST || prices.known(), "prices", "all 0",
                "give a price per kg for copper or magnets to rank by MATERIAL_COST, or rank by ACTIVE_MASS",
                "at least one price > 0");
        if (limits.maxCutInWindSpeedMs() > 0) {
            c.require(drive instanceof WindDrive, "limits.maxCutInWindSpeedMs", limits.maxCutInWindSpeedMs(),
                    "applies to a wind drive only; give 0", "0");
        }
        c.throwIfAny();
    }

    /**
     * The evaluation over speed of one proposed alternator with this load: 0 to the highest speed in 101 points,
     * rated and highest speeds as the sizing used them.
     *
     * @param alternator    a proposed design's alternator
     * @param ratedSpeedRpm its rated speed from {@link DesignFigures#ratedSpeedRpm()}, rpm, &gt; 0
     * @param maxSpeedRpm   the highest speed from {@link DesignFigures#maxSpeedRpm()}, rpm, &gt; 0
     */
    public EvaluationRequest evaluationRequest(AlternatorSpec alternator, double ratedSpeedRpm, double maxSpeedRpm) {
        double top = Math.max(ratedSpeedRpm, maxSpeedRpm);
        return new EvaluationRequest(alternator, load, new SpeedRange(0, top, 101), ratedSpeedRpm, top);
    }
}
