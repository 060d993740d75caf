package coilwright.system;

import coilwright.load.Load;
import coilwright.machine.Alternator;

import java.util.HashMap;
import java.util.Map;

/**
 * The torque a turning alternator takes besides its load current's: bearings, windage, stator iron, conductor eddy
 * currents and the delta circulating current ({@link MachineLosses#dragTorqueNm}), with the winding at the
 * temperature entered, the same one the operating curve uses. A wind rotor must overcome it before the alternator
 * reaches cut-in, so it sets where charging really starts. Above the loss models' top speed
 * ({@link MachineLosses#maxSpeedRpm}) the drag torque is held at its value there. Each speed is computed once. Not
 * thread-safe: one instance per matching run.
 */
public final class RunningDrag {
    private final MachineLosses losses;
    private final double windingC;
    private final double topRpm;
    private final Map<Double, Double> torqueNm = new HashMap<>();

    private RunningDrag(MachineLosses losses, double windingC, double topRpm) {
        this.losses = losses;
        this.windingC = windingC;
        this.topRpm = topRpm;
    }

    /** The drag of a built machine and its load, at its entered winding temperature and ambient. */
    public static RunningDrag of(Alternator alt, Load load) {
        return new RunningDrag(new MachineLosses(alt, load, alt.spec().ambientTempC()), alt.spec().windingTempC(),
                MachineLosses.maxSpeedRpm(alt));
    }

    /** No drag: the electrical torque alone (the matching of earlier versions). */
    public static RunningDrag none() {
        return new RunningDrag(null, 0, 0);
    }

    /**
     * Drag torque at the alternator shaft, N m (0 at standstill).
     *
     * @param speedRpm alternator speed, rpm, &gt;= 0
     */
    public double torqueNm(double speedRpm) {
        if (losses == null || speedRpm <= 0) {
            return 0;
        }
        return torqueNm.computeIfAbsent(Math.min(speedRpm, topRpm), n -> losses.dragTorqueNm(n, windingC));
    }

    /** Power the drag takes at a speed, W. */
    public double powerW(double speedRpm) {
        return torqueNm(speedRpm) * speedRpm * Math.PI / 30;
    }
}
