package coilwright.turbine;

import coilwright.validation.Checks;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * A micro-hydro site.
 *
 * @param grossHeadM     vertical drop from intake surface to the runner (or tailwater), m, > 0 and <= 2000
 * @param designFlowM3s  the flow the plant is designed to take, m^3/s, > 0 and <= 100
 * @param flowDuration   optional flow-duration curve: percentOfTime strictly increasing in 0..100,
 *                       flow not increasing (flow exceeded that share of the time); empty when unknown
 */
public record HydroSite(double grossHeadM, double designFlowM3s, List<FlowDurationPoint> flowDuration) {
    public HydroSite {
        Checks c = new Checks();
        c.rangeExclusiveMin("grossHeadM", grossHeadM, 0.0, 2000.0);
        c.rangeExclusiveMin("designFlowM3s", designFlowM3s, 0.0, 100.0);
        flowDuration = flowDuration == null ? List.of() : flowDuration;
        for (int i = 0; i < flowDuration.size(); i++) {
            c.present("flowDuration[" + i + "]", flowDuration.get(i));
        }
        c.throwIfAny();
        flowDuration = List.copyOf(flowDuration);
        c.require(flowDuration.size() != 1, "flowDuration", "1 point", "needs at least 2 points when given",
                ">= 2 points");
        for (int i = 0; i < flowDuration.size(); i++) {
            FlowDurationPoint p = flowDuration.get(i);
            String at = "flowDuration[" + i + "]";
            c.range(at + ".flowM3s", p.flowM3s(), 0.0, 10_000.0);
            c.range(at + ".percentOfTime", p.percentOfTime(), 0.0, 100.0);
            if (i > 0) {
                FlowDurationPoint q = flowDuration.get(i - 1);
                c.require(p.percentOfTime() > q.percentOfTime(), at + ".percentOfTime", p.percentOfTime(),
                        "must be > flowDuration[" + (i - 1) + "].percentOfTime = " + Checks.fmt(q.percentOfTime())
                                + " (strictly increasing)", "> " + Checks.fmt(q.percentOfTime()));
                c.require(p.flowM3s() <= q.flowM3s(), at + ".flowM3s", p.flowM3s(),
                        "must be <= flowDuration[" + (i - 1) + "].flowM3s = " + Checks.fmt(q.flowM3s())
                                + " (flow exceeded for longer is smaller)", "<= " + Checks.fmt(q.flowM3s()));
            }
        }
        c.throwIfAny();
    }

    /** A site with no flow-duration curve. */
    public HydroSite(double grossHeadM, double designFlowM3s) {
        this(grossHeadM, designFlowM3s, List.of());
    }

    /** True when a flow-duration curve was given. */
    public boolean hasFlowDuration() {
        return !flowDuration.isEmpty();
    }

    /**
     * Annual energy from the flow-duration curve, kWh: 8760 h times the trapezoid sum of the power at the
     * stream flows over the share of time between points. Time outside the curve's first and last
     * percentages counts as no output. The caller's function decides how a stream flow becomes power
     * (typically the plant takes min(stream flow, design flow), nothing below its minimum).
     *
     * @param powerAtStreamFlowW output power as a function of stream flow (m^3/s to W), finite and >= 0
     * @throws coilwright.validation.InfeasibleDesignException when the site has no flow-duration curve
     */
    public double annualEnergyKWh(DoubleUnaryOperator powerAtStreamFlowW) {
        new Checks().present("powerAtStreamFlowW", powerAtStreamFlowW).throwIfAny();
        if (flowDuration.isEmpty()) {
            throw new coilwright.validation.InfeasibleDesignException("flowDuration",
                    "Annual energy needs a flow-duration curve; none was given");
        }
        double energyWh = 0.0;
        for (int i = 1; i < flowDuration.size(); i++) {
            FlowDurationPoint a = flowDuration.get(i - 1);
            FlowDurationPoint b = flowDuration.get(i);
            double pa = checkedPower(powerAtStreamFlowW, a.flowM3s());
            double pb = checkedPower(powerAtStreamFlowW, b.flowM3s());
            energyWh += 0.5 * (pa + pb) * (b.percentOfTime() - a.percentOfTime()) / 100.0 * AnnualEnergy.HOURS_PER_YEAR;
        }
        return energyWh / 1000.0;
    }

    private static double checkedPower(DoubleUnaryOperator f, double flowM3s) {
        double p = f.applyAsDouble(flowM3s);
        new Checks().nonNegative("powerAtStreamFlowW(" + Checks.fmt(flowM3s) + ")", p).throwIfAny();
        return p;
    }
}
