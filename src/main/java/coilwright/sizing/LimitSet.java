package coilwright.sizing;

import coilwright.conductor.FillCheck;
import coilwright.safety.Cautions;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The limits of a search in the order the screen tries them (cheapest and most often binding first), with their
 * defaults resolved.
 *
 * @param limits   in screening order
 * @param applied  as reported to the user
 * @param notes    defaults taken and why
 */
record LimitSet(List<Limit> limits, List<AppliedLimit> applied, List<String> notes) {
    private static final double SQRT2 = Math.sqrt(2);

    static LimitSet of(SizingRequest req, DriveModel drive, LoadConstants lc) {
        Limits l = req.limits();
        List<Limit> out = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        boolean axial = req.build() instanceof AxialBuild;
        double fill = l.maxFill() > 0 ? l.maxFill()
                : axial ? FillCheck.AIR_CORED_WIRE_FILL_LIMIT : FillCheck.SLOTTED_COPPER_FILL_LIMIT;
        out.add(new FillLimit(fill, axial));
        openCircuit(req, drive, lc, out, notes);
        out.addAll(drive.limits());
        double jMax = l.maxCurrentDensityAPerMm2() > 0 ? l.maxCurrentDensityAPerMm2()
                : req.winding().cooling().highAPerMm2();
        out.add(FigureLimit.atMost("currentDensity", "limits.maxCurrentDensityAPerMm2", "A/mm^2", jMax,
                "stays within %.1f A/mm^2 at the rated point",
                s -> s.currentDensityAPerMm2(drive.ratedLineCurrentFloorA(s)),
                FullEvaluation::ratedCurrentDensityAPerMm2));
        if (l.minEfficiency() > 0) {
            out.add(FigureLimit.atLeast("efficiency", "limits.minEfficiency", "", l.minEfficiency(),
                    "is at least %.2f efficient at the rated point",
                    drive::ratedEfficiencyBound, FullEvaluation::ratedEfficiency));
        }
        if (l.maxCurrentDensityAPerMm2() == 0) {
            notes.add(String.format(Locale.ROOT, "Current density limited to %.1f A/mm^2, the top of the %s band; "
                    + "a winding-temperature limit will replace it when a thermal model is available", jMax,
                    req.winding().cooling().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
        }
        List<AppliedLimit> applied = out.stream()
                .map(x -> new AppliedLimit(x.name(), x.field(), x.allowed(), x.unit(), x.phrase())).toList();
        return new LimitSet(List.copyOf(out), applied, List.copyOf(notes));
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
