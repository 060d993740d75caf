package coilwright;

import coilwright.service.DesignDocument;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.AlternatorEvaluator;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedRange;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.TimeUnit;

/**
 * One full evaluation of each shipped example design with its speed range widened to 200 points.
 * Run: {@code mvn -Pjmh -DskipTests package exec:exec -Djmh.args=ExampleEvaluationBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ExampleEvaluationBenchmark {

    @Param({"axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v"})
    public String example;

    private EvaluationRequest request;

    @Setup
    public void load() throws IOException {
        String text;
        try (InputStream in = ExampleEvaluationBenchmark.class.getClassLoader()
                .getResourceAsStream("examples/" + example + ".json")) {
            if (in == null) {
                throw new IOException("example not on the classpath: " + example);
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        EvaluationRequest design = new RecordBinder(Json.mapper()).bind(text, DesignDocument.class).design();
        SpeedRange range = design.speedRange();
        request = new EvaluationRequest(design.alternator(), design.load(),
                new SpeedRange(range.minRpm(), range.maxRpm(), 200), design.ratedSpeedRpm(), design.maxSpeedRpm());
    }

    @Benchmark
    public AlternatorEvaluation evaluate_example_200_points() {
        return AlternatorEvaluator.evaluate(request);
    }
}
