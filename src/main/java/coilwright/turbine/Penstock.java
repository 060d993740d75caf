package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Head loss in a penstock: Darcy-Weisbach friction with the Colebrook friction factor (laminar 64/Re
 * below Re 2300), fitting losses K v^2/2g, and the Hazen-Williams formula as a cross-check.
 *
 * @param spec the pipe
 */
public record Penstock(PenstockSpec spec) {
    /** Default largest acceptable head loss as a share of gross head (common practice: 10 %). */
    public static final double DEFAULT_MAX_LOSS_SHARE = 0.10;
    /** Default water temperature, C (a cool stream; common practice). */
    public static final double DEFAULT_WATER_TEMP_C = 10.0;
    /** Above this share of disagreement the two friction methods are flagged. */
    public static final double HAZEN_WILLIAMS_AGREEMENT = 0.15;
    /** Above this mean velocity surge and abrasion become a concern, m/s (common practice). */
    public static final double HIGH_VELOCITY_MS = 5.0;
    private static final double G = WaterProperties.GRAVITY_MS2;

    public Penstock {
        new Checks().present("spec", spec).throwIfAny();
    }

    /**
     * Mean velocity Q / A, m/s.
     *
     * @param flowM3s flow, m^3/s, 0 to 100
     */
    public double velocityMs(double flowM3s) {
        new Checks().range("flowM3s", flowM3s, 0.0, 100.0).throwIfAny();
        return flowM3s / spec.boreAreaM2();
    }

    /** Reynolds number v D / nu at a flow and water temperature (0 to 40 C). */
    public double reynoldsNumber(double flowM3s, double waterTempC) {
        return velocityMs(flowM3s) * spec.innerDiameterM() / WaterProperties.kinematicViscosityM2s(waterTempC);
    }

    /**
     * Darcy-Weisbach friction loss h_f = f (L/D) v^2 / 2g, m; 0 at zero flow.
     *
     * @param flowM3s    flow, m^3/s, 0 to 100
     * @param waterTempC water temperature, C, 0 to 40
     */
    public double frictionLossM(double flowM3s, double waterTempC) {
        double re = reynoldsNumber(flowM3s, waterTempC);
        if (re == 0.0) {
            return 0.0;
        }
        double v = velocityMs(flowM3s);
        return PipeFriction.darcy(re, spec.relativeRoughness()) * spec.lengthM() / spec.innerDiameterM()
                * v * v / (2.0 * G);
    }

    /** Fitting losses K v^2 / 2g, m. */
    public double minorLossM(double flowM3s) {
        double v = velocityMs(flowM3s);
        return spec.sumMinorLossK() * v * v / (2.0 * G);
    }

    /**
     * Total head loss (friction plus fittings), m.
     *
     * @param flowM3s    flow, m^3/s, 0 to 100
     * @param waterTempC water temperature, C, 0 to 40
     */
    public double headLossM(double flowM3s, double waterTempC) {
        return frictionLossM(flowM3s, waterTempC) + minorLossM(flowM3s);
    }

    /**
     * Hazen-Williams friction loss in SI form h_f = 10.67 L Q^1.852 / (C^1.852 D^4.87), m (Williams &amp;
     * Hazen 1905; meant for water near room temperature in pipes of 50 mm and more).
     *
     * @param flowM3s flow, m^3/s, 0 to 100
     */
    public double hazenWilliamsLossM(double flowM3s) {
        new Checks().range("flowM3s", flowM3s, 0.0, 100.0).throwIfAny();
        return 10.67 * spec.lengthM() * Math.pow(flowM3s, 1.852)
                / (Math.pow(spec.hazenWilliamsC(), 1.852) * Math.pow(spec.innerDiameterM(), 4.87));
    }

    /** Net head and losses at the site's design flow, 10 C water, 10 % loss limit. */
    public PenstockResult analyse(HydroSite site) {
        new Checks().present("site", site).throwIfAny();
        return analyse(site.grossHeadM(), site.designFlowM3s(), DEFAULT_WATER_TEMP_C, DEFAULT_MAX_LOSS_SHARE);
    }

    /**
     * Net head, losses and penstock efficiency at one flow.
     *
     * @param grossHeadM    gross head, m, > 0 and <= 2000
     * @param flowM3s       flow, m^3/s, 0 to 100
     * @param waterTempC    water temperature, C, 0 to 40
     * @param maxLossShare  head-loss share above which a warning is given, > 0 and <= 0.5
     * @throws InfeasibleDesignException when the losses use up the whole gross head
     */
    public PenstockResult analyse(double grossHeadM, double flowM3s, double waterTempC, double maxLossShare) {
        new Checks().rangeExclusiveMin("grossHeadM", grossHeadM, 0.0, 2000.0)
                .range("flowM3s", flowM3s, 0.0, 100.0).range("waterTempC", waterTempC, 0.0, 40.0)
                .rangeExclusiveMin("maxLossShare", maxLossShare, 0.0, 0.5).throwIfAny();
        double v = velocityMs(flowM3s);
        double re = reynoldsNumber(flowM3s, waterTempC);
        double f = re == 0.0 ? 0.0 : PipeFriction.darcy(re, spec.relativeRoughness());
        double friction = frictionLossM(flowM3s, waterTempC);
        double minor = minorLossM(flowM3s);
        double loss = friction + minor;
        if (loss >= grossHeadM) {
            throw new InfeasibleDesignException("penstock.innerDiameterM", String.format(Locale.ROOT,
                    "Penstock head loss %.2f m at %.4f m3/s uses up the whole gross head %.2f m: "
                            + "use a wider pipe or less flow", loss, flowM3s, grossHeadM));
        }
        double hw = hazenWilliamsLossM(flowM3s);
        List<String> warnings = new ArrayList<>();
        if (loss > maxLossShare * grossHeadM) {
            warnings.add(String.format(Locale.ROOT, "Head loss %.1f %% of gross head exceeds %.0f %%: "
                    + "a wider penstock would deliver more power", 100 * loss / grossHeadM, 100 * maxLossShare));
        }
        if (friction > 0 && Math.abs(hw - friction) > HAZEN_WILLIAMS_AGREEMENT * friction) {
            warnings.add(String.format(Locale.ROOT, "Hazen-Williams gives %.2f m against Darcy-Weisbach %.2f m: "
                    + "check the roughness and C values (Hazen-Williams suits water in pipes of 50 mm and more)",
                    hw, friction));
        }
        if (v > HIGH_VELOCITY_MS) {
            warnings.add(String.format(Locale.ROOT, "Pipe velocity %.1f m/s is high: water-hammer surge on "
                    + "sudden closure and abrasion grow with it", v));
        }
        double net = grossHeadM - loss;
        return new PenstockResult(flowM3s, waterTempC, v, re, re > 0 && re < PipeFriction.LAMINAR_LIMIT_RE, f,
                friction, minor, loss, hw, grossHeadM, net, net / grossHeadM, loss / grossHeadM, warnings);
    }
}
