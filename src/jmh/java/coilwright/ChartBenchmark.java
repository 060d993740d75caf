package coilwright;

import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.Series;
import coilwright.web.charts.SvgCharts;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One speed-range chart as a results page draws it: 200 points in three series on two y axes, thinned to the pixel
 * width. A results page draws five. Target: well under 10 ms per chart, so charts stay a small share of a page.
 * Run: {@code mvn -Pjmh -DskipTests package exec:exec -Djmh.args=ChartBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ChartBenchmark {
    private final ChartSpec chart = chart();

    private static ChartSpec chart() {
        double[] speed = IntStream.range(0, 200).mapToDouble(i -> i * 5.0).toArray();
        double[] emf = IntStream.range(0, 200).mapToDouble(i -> i * 5.0 * 0.05).toArray();
        double[] terminal = IntStream.range(0, 200).mapToDouble(i -> Math.max(0, i * 5.0 * 0.05 - 3)).toArray();
        double[] power = IntStream.range(0, 200).mapToDouble(i -> i * i * 0.04).toArray();
        return ChartSpec.of("EMF and terminal voltage", new ChartSpec.Axis("Speed", "rpm"), new ChartSpec.Axis("Voltage", "V"),
                        List.of(new Series("EMF (line)", speed, emf), new Series("Terminal voltage", speed, terminal)))
                .withRightAxis(new ChartSpec.Axis("Battery power", "W"), List.of(new Series("Power to battery", speed, power)));
    }

    @Benchmark
    public String one_chart_of_200_points() {
        return SvgCharts.lineChart(chart);
    }
}
