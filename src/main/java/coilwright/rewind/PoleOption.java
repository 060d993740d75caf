package coilwright.rewind;

import java.util.List;

/**
 * One pole count a bare stator can be wound for.
 *
 * @param poles                     magnet poles 2p
 * @param slotsPerPolePerPhase      q = Q / (2 p m) as a reduced fraction, e.g. "1/2"
 * @param slotsPerPolePerPhaseValue q as a number
 * @param coilPitchSlots            coil pitch of the layout, slots
 * @param coilsPerPhase             coils in each phase
 * @param fundamentalWindingFactor  kw1 (distribution and pitch)
 * @param windingFactors            kw of the odd harmonics 1, 3, 5, ..., 13 in that order
 * @param lcmSlotsPoles             LCM(Q, 2p): cogging periods per revolution (higher means smoother)
 * @param gcdSlotsPoles             gcd(Q, 2p)
 * @param allowedParallelPaths      parallel-path counts the layout allows
 */
public record PoleOption(int poles, String slotsPerPolePerPhase, double slotsPerPolePerPhaseValue, int coilPitchSlots,
                         int coilsPerPhase, double fundamentalWindingFactor, List<Double> windingFactors,
                         int lcmSlotsPoles, int gcdSlotsPoles, List<Integer> allowedParallelPaths) {
    public PoleOption {
        windingFactors = List.copyOf(windingFactors);
        allowedParallelPaths = List.copyOf(allowedParallelPaths);
    }
}
