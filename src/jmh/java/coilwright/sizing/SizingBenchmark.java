package coilwright.sizing;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;
import coilwright.system.WindRegime;
import coilwright.system.WindSite;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindRotor;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.TimeUnit;

/**
 * Design from requirements. Targets: at least one million candidate screens per second per core
 * ({@code screen_per_candidate}, one thread, reported per candidate); a whole search of about 100 000 candidates,
 * refinement included, under 2 s on two cores ({@code whole_search}); and the speed-up of screen-then-refine over
 * refining every candidate, from {@code full_evaluation} (time of the full model on one candidate) x the space
 * size / the cores, against {@code whole_search}.
 * Run: {@code mvn -Pjmh -DskipTests package exec:exec -Djmh.args=SizingBenchmark}.
 */
@State(Scope.Benchmark)
@Fork(1)
public class SizingBenchmark {
    /** Candidates in each case of the screen benchmark: wires x strands x turns x connections. */
    static final int CASE_CANDIDATES = 5 * 3 * 131 * 2;

    @Param({"speed", "wind"})
    public String drive;

    private ForkJoinPool pool;
    private SizingRequest request;
    private SizingSearch.Prepared prepared;
    private Refiner refiner;
    private int caseIndex;
    private long candidate;

    static BatteryLoad battery24V() {
        return new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 0.8), new Cable(30, 1e-5, 30),
                new Cable(3, 2.5e-5, 25));
    }

    /**
     * About 100 000 candidates of an axial machine for a 24 V bank: two disc sizes and two stator thicknesses,
     * 12 to 16 poles, 10 to 140 turns of AWG 13 to 17 with up to three strands, star or delta, up to two paths.
     */
    static SizingRequest request(String drive) {
        AxialBuild build = new AxialBuild(List.of(0.36, 0.40), 0.01, List.of(0.013, 0.016), 0.0015, 0.001, 12, 16,
                List.of(new MagnetOption("N42", 0.040, 0.050, 0.010, List.of(1))), 40);
        WindingChoices w = new WindingChoices(10, 140, WireRange.awg(13, 17, 3), List.of(Connection.STAR,
                Connection.DELTA), 2, 0.9, Cooling.AIR_COOLED_AXIAL_OPEN_COIL, ThermalClass.H, 70);
        MaterialPrices prices = new MaterialPrices(15, 60, 8);
        if (drive.equals("wind")) {
            WindDrive wind = new WindDrive(new WindRotor(3.0, 3, new ParametricCp(0.40, 6.5), 500, 1.0, 1.0),
                    WindSite.standard(), WindRegime.rayleigh(5.0), 25, 10);
            return new SizingRequest(wind, battery24V(), build, w, new Limits(0, 0, 0, 0, 3.5),
                    Objective.ANNUAL_ENERGY, prices, 5, 100);
        }
        return new SizingRequest(new SpeedTargets(180, 300, 400, 600), battery24V(), build, w,
                new Limits(7, 0, 0, 0, 0), Objective.OUTPUT_AT_RATED, prices, 5, 100_000);
    }

    @Setup(Level.Trial)
    public void prepare() {
        pool = new ForkJoinPool(Runtime.getRuntime().availableProcessors());
        request = request(drive);
        prepared = new SizingSearch(pool).prepare(request, SizingProgress.NONE);
        refiner = new Refiner(prepared.space(), prepared.drive(), prepared.limits(), prepared.scoring(), pool,
                SizingProgress.NONE, () -> false);
        if (prepared.space().perCase() != CASE_CANDIDATES) {
            throw new IllegalStateException("the case size changed: " + prepared.space().perCase());
        }
    }

    @TearDown(Level.Trial)
    public void close() {
        pool.shutdown();
    }

    /** Screening throughput on one thread, per candidate (all limits and, for survivors, the objective bounds). */
    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 3, time = 2)
    @Measurement(iterations = 5, time = 2)
    @OperationsPerInvocation(CASE_CANDIDATES)
    public Screening.Outcome screen_per_candidate() {
        caseIndex = (caseIndex + 1) % prepared.space().cases().size();
        return prepared.screening().screenCase(caseIndex);
    }

    /** One whole search on all cores: layouts, screen, refinement, Pareto front. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 2)
    @Measurement(iterations = 5)
    public SizingResult whole_search() {
        return new SizingSearch(pool).run(request);
    }

    /** The full model on one candidate (what refining every candidate would cost each time). */
    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MICROSECONDS)
    @Warmup(iterations = 2, time = 2)
    @Measurement(iterations = 3, time = 2)
    public FullEvaluation full_evaluation() {
        candidate = (candidate + 7919) % prepared.space().size();
        return refiner.fullEvaluation(candidate);
    }
}
