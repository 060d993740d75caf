package coilwright.sizing;

import coilwright.cogging.CoggingCalculator;
import coilwright.cogging.CoggingInput;
import coilwright.load.Load;
import coilwright.machine.Alternator;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSpec;
import coilwright.system.MachineLosses;
import coilwright.thermal.CoolingConditions;
import coilwright.winding.WindingSpec;

import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The machine's own figures a search can limit: the winding's steady hot spot at the rated point, from the loss and
 * thermal models ({@link MachineLosses#steadyAt}: the temperature the losses at that temperature heat it to, in still
 * air at {@link CoolingConditions#DEFAULT_AMBIENT_C}), and the peak cogging torque ({@link CoggingCalculator}, which
 * depends on the geometry and magnets only, so it is worked out once per layout).
 */
final class MachineFigures {
    private MachineFigures() {
    }

    /** Peak cogging torque of a rotor and winding at a magnet temperature, N m; 0 without iron teeth. */
    static double coggingPeakNm(RotorSpec rotor, WindingSpec winding, double magnetTempC) {
        return rotor instanceof RadialSurfaceRotor r
                ? CoggingCalculator.radial(CoggingInput.of(r, winding, magnetTempC)).peakNm()
                : CoggingCalculator.airCored().peakNm();
    }

    /** Peak cogging torque of a built machine, N m. */
    static double coggingPeakNm(Alternator alt) {
        return coggingPeakNm(alt.spec().rotor(), alt.spec().winding(), alt.spec().magnetTempC());
    }

    /** Peak cogging torque of every layout, N m, by identity (layouts are made once per search). */
    static Map<Layout, Double> coggingByLayout(List<Layout> layouts, double magnetTempC) {
        Map<Layout, Double> out = new IdentityHashMap<>();
        for (Layout l : layouts) {
            out.put(l, coggingPeakNm(l.rotor(), l.winding(), magnetTempC));
        }
        return out;
    }

    /**
     * The winding's steady hot spot at the rated speed (at most the models' own top speed), C.
     *
     * @throws coilwright.validation.SolverFailedException when the winding temperature does not converge
     */
    static double ratedHotSpotC(Alternator alt, Load load, double ratedSpeedRpm) {
        MachineLosses losses = new MachineLosses(alt, load, CoolingConditions.DEFAULT_AMBIENT_C);
        return losses.steadyAt(Math.min(ratedSpeedRpm, MachineLosses.maxSpeedRpm(alt))).windingHotSpotC();
    }

    /**
     * A drive's evaluation with the machine's figures added. They take a thermal and a field solution per candidate,
     * so a search works them out for every candidate only when a limit asks for them, and otherwise for the designs
     * it reports ({@link Refiner#reported}).
     */
    static FullEvaluation add(FullEvaluation f, Alternator alt, Load load) {
        if (!f.built()) {
            return f;
        }
        return f.withMachine(ratedHotSpotC(alt, load, f.ratedSpeedRpm()), coggingPeakNm(alt));
    }
}
