package coilwright;

import coilwright.service.DesignDocument;
import coilwright.system.EvaluationRequest;
import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.HydroMatcher;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.system.WindMatching;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.TimeUnit;

/**
 * One wind match and one hydro match per request, as the service runs them (the alternator built from its spec,
 * the turbine matched at every wind speed or flow, the annual energy included): the wind example with a 3.6 m
 * rotor over a Weibull regime, the radial hydro example on a 28 m head with a flow-duration table.
 * Target: at most 15 ms each, warm. Run: {@code mvn -Pjmh -DskipTests package exec:exec -Djmh.args=MatchBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class MatchBenchmark {

    private WindMatchRequest wind;
    private HydroMatchRequest hydro;

    @Setup
    public void load() throws IOException {
        RecordBinder binder = new RecordBinder(Json.mapper());
        ObjectNode w = alternatorAndLoad(binder, "axial-wind-48v");
        ObjectNode rotor = w.putObject("rotor");
        rotor.put("diameterM", 3.6).put("bladeCount", 3);
        rotor.putObject("curve").put("type", "ParametricCp").put("cpMax", 0.42).put("tipSpeedRatioOpt", 6.5);
        rotor.put("maxRotorSpeedRpm", 450).put("driveRatio", 1.0).put("drivetrainEfficiency", 1.0);
        w.putObject("site").put("altitudeM", 300).put("temperatureC", 12).put("airDensityKgM3", 0);
        w.putObject("wind").put("meanWindSpeedMs", 5.0).put("weibullShapeK", 2.0);
        w.put("maxWindSpeedMs", 25);
        wind = binder.bind(w.toString(), WindMatchRequest.class);

        ObjectNode h = alternatorAndLoad(binder, "radial-hydro-48v");
        ObjectNode site = h.putObject("site").put("grossHeadM", 28).put("designFlowM3s", 0.012);
        ArrayNode table = site.putArray("flowDuration");
        table.addObject().put("flowM3s", 0.02).put("percentOfTime", 0);
        table.addObject().put("flowM3s", 0.012).put("percentOfTime", 40);
        table.addObject().put("flowM3s", 0.006).put("percentOfTime", 100);
        h.putObject("penstock").put("lengthM", 150).put("innerDiameterM", 0.09).put("roughnessM", 1.5e-6)
                .put("hazenWilliamsC", 150).put("sumMinorLossK", 2.5);
        h.putObject("runner").put("kind", "IMPULSE").put("jetCount", 2).put("diameterM", 0)
                .put("targetSpeedRpm", 900).put("peakEfficiency", 0);
        h.put("driveRatio", 1.0).put("drivetrainEfficiency", 0.95).put("waterTempC", 10);
        hydro = binder.bind(h.toString(), HydroMatchRequest.class);
    }

    private static ObjectNode alternatorAndLoad(RecordBinder binder, String slug) throws IOException {
        String text;
        try (InputStream in = MatchBenchmark.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            if (in == null) {
                throw new IOException("example not on the classpath: " + slug);
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        EvaluationRequest design = binder.bind(text, DesignDocument.class).design();
        ObjectNode out = Json.mapper().createObjectNode();
        out.set("alternator", Json.mapper().valueToTree(design.alternator()));
        out.set("load", Json.mapper().valueToTree(design.load()));
        return out;
    }

    @Benchmark
    public WindMatchResult wind_match_with_annual_energy() {
        return WindMatching.match(wind);
    }

    @Benchmark
    public HydroMatchResult hydro_match_with_annual_energy() {
        return HydroMatcher.match(hydro);
    }
}
