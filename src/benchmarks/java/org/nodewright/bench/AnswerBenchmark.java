package org.nodewright.bench;

import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.util.concurrent.TimeUnit;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.strings.StringAnalysisRequest;
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
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.StreamWriteFeature;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.json.JsonMapper;

/**
 * The serialised answer: a request object to the bytes of its JSON answer, as the endpoints do it
 * (the endpoint's own service or controller method, then Jackson), for the default 24-mode string,
 * the workshop whistle with its nine fingerings, and the 200-frustum curved bore (4000 points).
 * {@code boreAnswerToBytes} is Jackson alone on a ready answer and {@code boreRequestFromBytes} the
 * request parsing alone, so the cost of JSON can be told from the physics. {@code fastDoubles}
 * switches Jackson's StreamWriteFeature/StreamReadFeature USE_FAST_DOUBLE_WRITER/PARSER.
 * The endpoint methods are package-private; they are called through reflection, whose cost is
 * nanoseconds against microseconds.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(2)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 5, time = 1)
public class AnswerBenchmark {

    static final String STRING = """
            {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
             "endCondition": "pinned", "stiffness": true, "modeCount": 24,
             "pluck": {"positionMm": 120.0, "kind": "pluck"},
             "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}""";

    static final String WHISTLE = """
            {"segments": [{"lengthMm": 284.5, "inputDiameterMm": 13.0, "outputDiameterMm": 13.0}],
             "inputEnd": "open", "outputEnd": "open-unflanged",
             "holes": [{"positionMm": 138.0, "diameterMm": 6.5, "chimneyMm": 2.5, "open": true},
                       {"positionMm": 158.0, "diameterMm": 7.0, "chimneyMm": 2.5, "open": true},
                       {"positionMm": 178.5, "diameterMm": 7.0, "chimneyMm": 2.5, "open": true},
                       {"positionMm": 203.0, "diameterMm": 6.0, "chimneyMm": 2.5, "open": true},
                       {"positionMm": 215.5, "diameterMm": 7.5, "chimneyMm": 2.5, "open": true},
                       {"positionMm": 239.5, "diameterMm": 6.5, "chimneyMm": 2.5, "open": true}],
             "temperatureC": 20.0, "relativeHumidityPct": 50.0, "losses": true,
             "fMinHz": 300.0, "fMaxHz": 3000.0, "points": 3000,
             "fingerings": [
               {"name": "D5", "closedHoles": [0, 1, 2, 3, 4, 5], "targetNote": "D5", "register": 1},
               {"name": "E5", "closedHoles": [0, 1, 2, 3, 4], "targetNote": "E5", "register": 1},
               {"name": "F#5", "closedHoles": [0, 1, 2, 3], "targetNote": "F#5", "register": 1},
               {"name": "G5", "closedHoles": [0, 1, 2], "targetNote": "G5", "register": 1},
               {"name": "A5", "closedHoles": [0, 1], "targetNote": "A5", "register": 1},
               {"name": "B5", "closedHoles": [0], "targetNote": "B5", "register": 1},
               {"name": "C#6", "closedHoles": [], "targetNote": "C#6", "register": 1},
               {"name": "D6", "closedHoles": [0, 1, 2, 3, 4, 5], "targetNote": "D6", "register": 2},
               {"name": "E6", "closedHoles": [0, 1, 2, 3, 4], "targetNote": "E6", "register": 2}]}""";

    /** The 200 frusta of r = 6 mm + 18 mm u² over 600 mm, closed input, losses on, 4000 points. */
    static String bore() {
        StringBuilder b = new StringBuilder("{\"segments\": [");
        for (int i = 0; i < 200; i++) {
            double ua = i / 200.0;
            double ub = (i + 1) / 200.0;
            b.append(i == 0 ? "" : ",").append("{\"lengthMm\": 3.0, \"inputDiameterMm\": ")
                    .append(12 + 36 * ua * ua).append(", \"outputDiameterMm\": ").append(12 + 36 * ub * ub).append('}');
        }
        return b.append("], \"inputEnd\": \"closed\", \"outputEnd\": \"open-unflanged\", \"temperatureC\": 20.0,"
                + " \"relativeHumidityPct\": 0.0, \"losses\": true, \"fMinHz\": 20.0, \"fMaxHz\": 3000.0,"
                + " \"points\": 4000}").toString();
    }

    @Param({"false", "true"})
    public boolean fastDoubles;

    JsonMapper mapper;
    Object stringService;
    Method stringAnalyze;
    Object airController;
    Method airAnalyze;
    StringAnalysisRequest string;
    AirColumnRequest whistle;
    AirColumnRequest bore;
    byte[] boreBytes;
    Object boreAnswer;

    @Setup
    public void setUp() throws Exception {
        JsonFactory factory = JsonFactory.builder()
                .configure(StreamWriteFeature.USE_FAST_DOUBLE_WRITER, fastDoubles)
                .configure(StreamReadFeature.USE_FAST_DOUBLE_PARSER, fastDoubles)
                .build();
        mapper = JsonMapper.builder(factory).addModule(org.nodewright.web.EnumWords.module()).build();
        stringService = instance("org.nodewright.strings.StringAnalysisService");
        stringAnalyze = method(stringService, "analyze", StringAnalysisRequest.class);
        airController = instance("org.nodewright.aircolumns.AirColumnController");
        airAnalyze = method(airController, "analyze", AirColumnRequest.class);
        string = mapper.readValue(STRING, StringAnalysisRequest.class);
        whistle = mapper.readValue(WHISTLE, AirColumnRequest.class);
        boreBytes = bore().getBytes(java.nio.charset.StandardCharsets.UTF_8);
        bore = mapper.readValue(boreBytes, AirColumnRequest.class);
        boreAnswer = airAnalyze.invoke(airController, bore);
    }

    private static Object instance(String name) throws Exception {
        Constructor<?> c = Class.forName(name).getDeclaredConstructor();
        c.setAccessible(true);
        return c.newInstance();
    }

    private static Method method(Object target, String name, Class<?> arg) throws Exception {
        Method m = target.getClass().getDeclaredMethod(name, arg);
        m.setAccessible(true);
        return m;
    }

    @Benchmark
    public byte[] stringDefault() throws Exception {
        return mapper.writeValueAsBytes(stringAnalyze.invoke(stringService, string));
    }

    @Benchmark
    public byte[] whistle() throws Exception {
        return mapper.writeValueAsBytes(airAnalyze.invoke(airController, whistle));
    }

    @Benchmark
    public byte[] bore200() throws Exception {
        return mapper.writeValueAsBytes(airAnalyze.invoke(airController, bore));
    }

    @Benchmark
    public byte[] boreAnswerToBytes() {
        return mapper.writeValueAsBytes(boreAnswer);
    }

    @Benchmark
    public AirColumnRequest boreRequestFromBytes() {
        return mapper.readValue(boreBytes, AirColumnRequest.class);
    }
}
