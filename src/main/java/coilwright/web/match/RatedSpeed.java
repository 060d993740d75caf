package coilwright.web.match;

import coilwright.system.HydroMatchResult;
import coilwright.system.WindMatchPoint;
import coilwright.system.WindMatchResult;
import coilwright.web.Choice;
import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * The alternator speeds a match result offers back to the design form as its rated speed: one per whole wind speed
 * that charges (wind), or the matched speed (hydro). The value posted is the alternator's speed in rpm.
 */
final class RatedSpeed {
    /** The wind speed offered first: a common rating point for small wind turbines (common practice). */
    static final double USUAL_RATED_WIND_MS = 10.0;

    private RatedSpeed() {
    }

    /** Whole wind speeds that charge, in order, the usual rated wind speed (or the nearest below it) moved first. */
    static List<Choice> wind(WindMatchResult r, Units units) {
        List<Choice> out = new ArrayList<>();
        int usual = -1;
        for (WindMatchPoint p : r.points()) {
            if (p.windSpeedMs() % 1 == 0 && p.powerToBatteryW() > 0 && p.alternatorSpeedRpm() > 0) {
                if (p.windSpeedMs() <= USUAL_RATED_WIND_MS) {
                    usual = out.size();
                }
                out.add(new Choice(Fmt.plain(p.alternatorSpeedRpm(), 4), Fmt.plain(p.alternatorSpeedRpm(), 3)
                        + " rpm, at " + new Fmt(units).shown(Shown.METRE_PER_SECOND, p.windSpeedMs(), 3) + " of wind (" + Fmt.plain(p.powerToBatteryW(), 3)
                        + " W to the battery)"));
            }
        }
        if (usual > 0) {
            out.add(0, out.remove(usual));
        }
        return out;
    }

    /** The matched alternator speed. */
    static List<Choice> hydro(HydroMatchResult r) {
        double n = r.matched().alternatorSpeedRpm();
        return n > 0 ? List.of(new Choice(Fmt.plain(n, 4), Fmt.plain(n, 3) + " rpm, the matched speed ("
                + Fmt.plain(r.matched().powerToBatteryW(), 3) + " W to the battery)")) : List.of();
    }
}
