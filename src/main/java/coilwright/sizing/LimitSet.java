package coilwright.sizing;

import coilwright.conductor.FillCheck;
import coilwright.safety.Cautions;
import coilwright.thermal.CoolingConditions;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The limits of a search in the order the screen tries them (cheapest and most often binding first), with their
 * defaults resolved.
 *
 * @param limits   in screening order
 * @param applied  as reported to the user
 * @param notes    defaults taken and why
 */
record LimitSet(List<Limit> limits, List<AppliedLimit> applied, List<String> notes, boolean needsMachineFigures) {
    private static final double SQRT2 = Math.sqrt(2);

    /**
     * @param layouts the search's layouts (for the cogging of each, worked out once)
     */
    static LimitSet of(SizingRequest req, DriveModel drive, LoadConstants lc, List<Layout> layouts) {
        Limits l = req.limits();
        List<Limit> out = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        boolean axial = req.build() instanceof AxialBuild;
        double fill = l.maxFill() > 0 ? l.maxFill()
                : axial ? FillCheck.AIR_CORED_WIRE_FILL_LIMIT : FillCheck.SLOTTED_COPPER_FILL_LIMIT;
        out.add(new FillLimit(fill, axial));
        openCircuit(req, drive, lc, out, notes);
        out.addAll(drive.limits());
        boolean byTemperature = l.maxWindingTempC().isPresent() && l.maxCurrentDensityAPerMm2() == 0;
        double jMax = l.maxCurrentDensityAPerMm2() > 0 ? l.maxCurrentDensityAPerMm2()
                : req.winding().cooling().highAPerMm2();
        if (!byTemperature) {
            out.add(FigureLimit.atMost("currentDensity", "limits.maxCurrentDensityAPerMm2", "A/mm^2", jMax,
                    "stays within %.1f A/mm^2 at the rated point",
                    s -> s.currentDensityAPerMm2(drive.ratedLineCurrentFloorA(s)),
                    FullEvaluation::ratedCurrentDensityAPerMm2));
        }
        if (l.minEfficiency() > 0) {
            out.add(FigureLimit.atLeast("efficiency", "limits.minEfficiency", "", l.minEfficiency(),
                    "is at least %.2f efficient at the rated point",
                    drive::ratedEfficiencyBound, FullEvaluation::ratedEfficiency));
        }
        String band = req.winding().cooling().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        if (byTemperature) {
            notes.add(String.format(Locale.ROOT, "The winding temperature limit replaces the %s current-density "
                    + "band (%.1f A/mm^2 at most): the thermal model decides what the winding can carry", band, jMax));
        } else if (l.maxCurrentDensityAPerMm2() == 0) {
            notes.add(String.format(Locale.ROOT, "Current density limited to %.1f A/mm^2, the top of the %s band; "
                    + "give limits.maxWindingTempC to limit the winding's hot spot by the thermal model instead",
                    jMax, band));
        }
        machineLimits(req, drive, layouts, out, notes);
        List<AppliedLimit> applied = out.stream()
                .map(x -> new AppliedLimit(x.name(), x.field(), x.allowed(), x.unit(), x.phrase())).toList();
        boolean machine = l.maxWindingTempC().isPresent() || l.maxCoggingPercent().isPresent();
        return new LimitSet(List.copyOf(out), applied, List.copyOf(notes), machine);
    }

    /**
     * The winding temperature and cogging limits, last: their full figures cost a thermal and a field solution.
     * The winding is never cooler than the air around it, so the screen's bound of the hot spot is the ambient
     * temperature (it discards nothing: every limit allowed is above it). Cogging is exact per layout; the rated
     * shaft torque is at most the drive's bound ({@link DriveModel#ratedShaftTorqueBoundNm}), so the percentage is
     * at least the cogging over that bound.
     */
    private static void machineLimits(SizingRequest req, DriveModel drive, List<Layout> layouts, List<Limit> out,
                                      List<String> notes) {
        Limits l = req.limits();
        if (l.maxWindingTempC().isPresent()) {
            double t = l.maxWindingTempC().getAsDouble();
            double insulation = req.winding().insulationClass().limitC();
            out.add(FigureLimit.atMost("windingTemperature", "limits.maxWindingTempC", "C", t,
                    "keeps the winding's hot spot within %.0f C at the rated point (still air at "
                            + Math.round(CoolingConditions.DEFAULT_AMBIENT_C) + " C)",
                    s -> CoolingConditions.DEFAULT_AMBIENT_C, FullEvaluation::ratedWindingHotSpotC));
            if (t > insulation) {
                notes.add(String.format(Locale.ROOT, "The winding temperature limit, %.0f C, is above the class %s "
                        + "insulation's %.0f C: a design near it ages its insulation fast", t,
                        req.winding().insulationClass().name(), insulation));
            }
        }
        if (l.maxCoggingPercent().isPresent()) {
            Map<Layout, Double> cogging = MachineFigures.coggingByLayout(layouts, req.build().magnetTempC());
            out.add(FigureLimit.atMost("cogging", "limits.maxCoggingPercent", "%", l.maxCoggingPercent().getAsDouble(),
                    "cogs at most %.1f %% of its shaft torque at the rated point",
                    s -> coggingPercentBound(cogging.get(s.windingCase.layout()), drive.ratedShaftTorqueBoundNm(s)),
                    FullEvaluation::coggingPercentOfRated));
        }
    }

    /** The least cogging percentage a torque bound allows (the same rule as the full figure). */
    static double coggingPercentBound(double coggingNm, double torqueBoundNm) {
        if (coggingNm == 0) {
            return 0;
        }
        return torqueBoundNm > 0 ? 100 * coggingNm / torqueBoundNm : Double.POSITIVE_INFINITY;
    }

    /**
     * The open-circuit limit: the one given, or extra-low voltage (50 V AC rms, which also keeps the rectified
     * peak under 120 V DC) when a design meeting the cut-in limits can stay under it. A design cutting in at the
     * highest allowed speed n_c has sqrt(2) Ke_LL n_c = V_b + 2 V_d, so at the check speed n_max it reaches at
     * least (V_b + 2 V_d) / sqrt(2) x n_max / n_c; when that is above 50 V the battery does not allow
     * extra-low voltage and no default limit is set (the danger caution then applies to every result).
     */
    private static void openCircuit(SizingRequest req, DriveModel drive, LoadConstants lc, List<Limit> out,
                                    List<String> notes) {
        double speed = drive.checkSpeedRpm();
        double given = req.limits().maxOpenCircuitLineRmsV();
        double lowest = lc.thresholdV() / SQRT2 * speed / drive.highestCutInRpm();
        double allowed = given;
        if (given == 0) {
            if (lowest <= Cautions.ELV_AC_RMS_V) {
                allowed = Cautions.ELV_AC_RMS_V;
                notes.add(String.format(Locale.ROOT, "Open-circuit voltage kept within extra-low voltage, %.0f V AC "
                        + "rms at %.0f rpm (%s), source: IEC 61140 / IEC 60449 voltage band I", allowed, speed,
                        drive.checkSpeedSource()));
            } else {
                notes.add(String.format(Locale.ROOT, "No open-circuit limit: any design that meets the cut-in limit "
                        + "reaches at least %.0f V AC rms at %.0f rpm (%s), above the %.0f V extra-low-voltage limit. "
                        + "Every design carries the danger caution: wire, isolate and label it as for mains voltage "
                        + "and follow local codes", lowest, speed, drive.checkSpeedSource(), Cautions.ELV_AC_RMS_V));
                return;
            }
        }
        out.add(FigureLimit.atMost("openCircuitVoltage", "limits.maxOpenCircuitLineRmsV", "V", allowed,
                "stays under %.0f V open-circuit at " + Math.round(speed) + " rpm", s -> s.openCircuitV(speed),
                FullEvaluation::openCircuitLineRmsV));
    }

    /** The first limit a full evaluation breaks, or -1. */
    int firstBroken(FullEvaluation f) {
        for (int i = 0; i < limits.size(); i++) {
            if (limits.get(i).rejects(f)) {
                return i;
            }
        }
        return -1;
    }

    /** The number of limits a full evaluation breaks. */
    int brokenCount(FullEvaluation f) {
        int n = 0;
        for (Limit x : limits) {
            n += x.rejects(f) ? 1 : 0;
        }
        return n;
    }
}
