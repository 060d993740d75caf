package coilwright;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.conductor.WireGauge;
import coilwright.conductor.WireSpec;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.AirCoredStator;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.magnet.AxialDualRotor;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.winding.Layers;
import coilwright.winding.WindingSpec;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.concurrent.TimeUnit;

/**
 * One full evaluation of an alternator with 200 operating points, the bridge rectifier solved at each.
 * Target: median at most 1 ms on a 2-core machine. Run: {@code mvn -Pjmh -DskipTests package exec:exec -Djmh.args=EvaluationBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EvaluationBenchmark {

    final EvaluationRequest request = new EvaluationRequest(
            new AlternatorSpec(new WindingSpec(12, 16, 3, Layers.DOUBLE, 0, 1, 0), 36, Connection.STAR,
                    new AxialDualRotor("N42", 0.040, 0.050, 0.150, 0.010, 0.013, 0.0015),
                    new AirCoredStator(0.016, 0.035, 0.010), new WireSpec(WireGauge.AWG, 14, 0, 2, 1),
                    Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 60, 40, 0, 0),
            new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                    new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 0),
                    new Cable(15, 6e-6, 30), new Cable(3, 16e-6, 25)),
            new SpeedRange(0, 600, 200), 400, 900);

    final Alternator alternator = AlternatorModel.build(request.alternator());

    @Benchmark
    public AlternatorEvaluation evaluate_200_points() {
        return AlternatorEvaluator.evaluate(request);
    }

    /** The 200 operating points alone (no cut-in bisection, rated point or cautions): the solver's share. */
    @Benchmark
    public double solve_200_points_only() {
        double sum = 0;
        for (int i = 0; i < request.speedRange().points(); i++) {
            sum += AlternatorEvaluator.point(alternator, request.load(), request.speedRange().speedRpm(i)).dcCurrentA();
        }
        return sum;
    }

    /** The same 200 points on one warm-started sweep in speed order (the path evaluate_200_points takes). */
    @Benchmark
    public double solve_200_points_warm_sweep() {
        coilwright.load.LoadSolver.Sweep sweep = coilwright.load.LoadSolver.sweep(
                new coilwright.load.AcSource(alternator.spec().winding().phases(), alternator.spec().connection(), 0, 1,
                        alternator.phaseResistanceHotOhm(), alternator.phaseInductanceH()), request.load());
        double sum = 0;
        for (int i = 0; i < request.speedRange().points(); i++) {
            double speed = request.speedRange().speedRpm(i);
            if (speed > 0) {
                sum += sweep.solveAt(alternator.emfPhaseRmsV(speed), alternator.frequencyHz(speed)).dcCurrentA();
            }
        }
        return sum;
    }
}
