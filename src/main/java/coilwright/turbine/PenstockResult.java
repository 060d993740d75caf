package coilwright.turbine;

import java.util.List;

/**
 * Penstock losses and net head at one flow.
 *
 * @param flowM3s                    flow, m^3/s
 * @param waterTempC                 water temperature used for the viscosity, C
 * @param velocityMs                 mean velocity in the pipe, m/s
 * @param reynoldsNumber             Re = v D / nu
 * @param laminar                    true when Re < 2300 (f = 64/Re)
 * @param frictionFactor             Darcy friction factor (Colebrook or laminar)
 * @param frictionLossM              Darcy-Weisbach friction loss f (L/D) v^2/2g, m
 * @param minorLossM                 fitting losses K v^2/2g, m
 * @param headLossM                  friction plus fitting losses, m
 * @param hazenWilliamsFrictionLossM friction loss by Hazen-Williams, the cross-check, m
 * @param grossHeadM                 gross head, m
 * @param netHeadM                   gross head minus the head loss, m
 * @param penstockEfficiency         net head / gross head
 * @param lossShare                  head loss / gross head
 * @param warnings                   advice (loss above the chosen share, poor agreement of the two methods, ...)
 */
public record PenstockResult(double flowM3s, double waterTempC, double velocityMs, double reynoldsNumber,
                             boolean laminar, double frictionFactor, double frictionLossM, double minorLossM,
                             double headLossM, double hazenWilliamsFrictionLossM, double grossHeadM,
                             double netHeadM, double penstockEfficiency, double lossShare, List<String> warnings) {
    public PenstockResult {
        warnings = List.copyOf(warnings);
    }
}
