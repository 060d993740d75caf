package coilwright.rewind;

import coilwright.load.AcSource;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.DiodeType;
import coilwright.load.LoadSolver;
import coilwright.load.OperatingPoint;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;

import java.util.Optional;

/** Charging current and copper loss of an option at the target speed, through the load package's bridge solver. */
final class OutputEstimator {
    private OutputEstimator() {
    }

    /**
     * The operating point of an option at the target speed, when the target is a battery and the machine's
     * resistance and inductance were measured; empty otherwise. The inductance scales with the square of the series
     * turns per phase (same magnetic paths): L_new = L_old (N_ph,new / N_ph,old)^2.
     */
    static Optional<OutputEstimate> at(ExistingMachine machine, MachineCharacterisation ch, RewindTarget target,
                                       Connection conn, double keLineRmsVPerRpm, int seriesTurnsPerPhase,
                                       Optional<Double> phaseResistanceOhm) {
        if (target.kind() != RewindTarget.Kind.BATTERY_CUT_IN || phaseResistanceOhm.isEmpty()
                || ch.phaseInductanceH().isEmpty()) {
            return Optional.empty();
        }
        double turnsRatio = (double) seriesTurnsPerPhase / ch.seriesTurnsPerPhase();
        double lPh = ch.phaseInductanceH().get().value() * turnsRatio * turnsRatio;
        double n = target.targetSpeedRpm();
        double f = ch.poles() / 2.0 * n / 60.0;
        double ePh = keLineRmsVPerRpm * n / Terminals.lineVoltageFactor(machine.phases(), conn);
        AcSource source = new AcSource(machine.phases(), conn, ePh, f, phaseResistanceOhm.get(), lPh);
        BridgeType type = machine.phases() == 3 ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE;
        BatteryLoad load = new BatteryLoad(Battery.custom(target.batteryVoltageV()),
                new Rectifier(type, DiodeType.SILICON, target.diodeDropV()), Cable.NONE, Cable.NONE);
        OperatingPoint p = LoadSolver.solve(source, load);
        return Optional.of(new OutputEstimate(n, f, p.dcCurrentA(), p.powerToLoadW(), p.phaseCurrentRmsA(),
                p.windingCopperLossW(), p.diodeLossW(), p.efficiencyFromEmf(), lPh));
    }
}
