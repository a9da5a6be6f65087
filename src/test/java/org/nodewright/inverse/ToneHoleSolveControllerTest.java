package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class ToneHoleSolveControllerTest {


    @Autowired
    MockMvc mvc;

    @Autowired
    SolveJobs jobs;

    String demo() throws Exception {
        return mvc.perform(get("/api/v1/inverse/tone-holes/demo")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
    }

    String waitFor(String id) throws Exception {
        for (int i = 0; i < 600; i++) {
            String body = mvc.perform(get("/api/v1/inverse/jobs/" + id)).andExpect(status().isOk())
                    .andReturn().getResponse().getContentAsString();
            String s = JsonPath.read(body, "$.status");
            if (!"queued".equals(s) && !"running".equals(s)) {
                return body;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the job did not finish");
    }

    @Test
    void theDemoWhistleSolvesToWithinItsToleranceAndHandsBackTheAdjustedBore() throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                        .content(demo()))
                .andExpect(status().isAccepted())
                .andExpect(header().string("Location", org.hamcrest.Matchers.startsWith("/api/v1/inverse/jobs/")))
                .andReturn().getResponse().getContentAsString();
        String done = waitFor(JsonPath.read(created, "$.id"));
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("succeeded");
        // The demo asks for the default 0.1-cent tolerance and the result says it was met: every note
        // must then be within 0.1 cent (a 3-cent window would pass a solve that stopped half way).
        assertThat((Boolean) JsonPath.read(done, "$.result.withinTolerance")).isTrue();
        double tolerance = ((Number) JsonPath.read(done, "$.result.toleranceCents")).doubleValue();
        assertThat(tolerance).isEqualTo(0.1);
        List<Double> cents = numbers(done, "$.result.notes[*].achievedCents");
        assertThat(cents).hasSize(7).allSatisfy(c -> assertThat(Math.abs(c)).isLessThanOrEqualTo(tolerance));
        List<Double> moved = numbers(done, "$.result.holes[*].movedMm");
        List<Double> solved = numbers(done, "$.result.holes[*].positionMm");
        List<Double> inBore = numbers(done, "$.result.bore.holes[*].positionMm");
        assertThat(inBore).isEqualTo(solved);
        assertThat(moved).anySatisfy(m -> assertThat(Math.abs(m)).isGreaterThan(1.0));
        // The adjusted bore is a valid air-column request: the bore bench's analysis accepts it.
        String bore = com.jayway.jsonpath.JsonPath.parse(done).read("$.result.bore", net.minidev.json.JSONObject.class)
                .toJSONString();
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON).content(bore))
                .andExpect(status().isOk());
    }

    static List<Double> numbers(String json, String path) {
        List<Number> raw = JsonPath.read(json, path);
        return raw.stream().map(Number::doubleValue).toList();
    }

    /** A solve that needs many evaluations: 0.001 cent on every note, diameters free, a 5000-evaluation cap. */
    String longSolve() throws Exception {
        String demo = demo();
        assertThat(demo).contains("\"toleranceCents\":null", "\"maxEvaluations\":null", "\"varyDiameters\":false");
        return demo.replace("\"toleranceCents\":null", "\"toleranceCents\":0.001")
                .replace("\"maxEvaluations\":null", "\"maxEvaluations\":5000")
                .replace("\"varyDiameters\":false", "\"varyDiameters\":true");
    }

    String start(String body) throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        return JsonPath.read(created, "$.id");
    }

    /**
     * The single solver thread is held by a job of the test's own, so the solve waits in the queue:
     * a cancel that works ends it at once without it ever starting; one that does nothing leaves it
     * queued, and it runs (and succeeds) once the worker is free.
     */
    @Test
    void aWaitingJobIsCancelledAtOnceAndNeverRuns() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        SolveJob blocker = jobs.submit("test-blocker", j -> {
            try {
                release.await(60, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return "released";
        });
        try {
            String id = start(demo());
            mvc.perform(delete("/api/v1/inverse/jobs/" + id)).andExpect(status().isAccepted())
                    .andExpect(jsonPath("$.status").value("cancelled"));
            release.countDown();
            waitFor(blocker.id());
            String done = waitFor(id);
            assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("cancelled");
            assertThat((Object) JsonPath.read(done, "$.elapsedSeconds")).isNull();
            assertThat((Object) JsonPath.read(done, "$.result")).isNull();
        } finally {
            release.countDown();
        }
    }

    /**
     * A running solve stops at its next evaluation. The cancel is sent while the test holds the job's
     * lock, having seen it running: the solver cannot record success in between, so only a cancel
     * that the solver honours ends in "cancelled", well short of the cap.
     */
    @Test
    void aRunningJobStopsAtItsNextEvaluation() throws Exception {
        String id = start(longSolve());
        SolveJob job = jobs.find(id).orElseThrow();
        for (int i = 0; i < 600 && job.view().progress().evaluations() < 1; i++) {
            Thread.sleep(20);
        }
        synchronized (job) {
            assertThat(job.status()).isEqualTo(SolveJob.Status.RUNNING);
            mvc.perform(delete("/api/v1/inverse/jobs/" + id)).andExpect(status().isAccepted());
        }
        String done = waitFor(id);
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("cancelled");
        assertThat((Object) JsonPath.read(done, "$.result")).isNull();
        assertThat(((Number) JsonPath.read(done, "$.progress.evaluations")).intValue()).isLessThan(5000);
    }

    @Test
    void unknownJobIsA404ProblemDocument() throws Exception {
        mvc.perform(get("/api/v1/inverse/jobs/no-such-job")).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"positionMm\":148.0 | \"positionMm\":100.0 | bore.holes[1].positionMm",
        "\"maxDiameterMm\":9.0 | \"maxDiameterMm\":1.0 | limits.maxDiameterMm",
        "\"maxEvaluations\":null | \"maxEvaluations\":1000000000 | maxEvaluations",
        "\"toleranceCents\":null | \"toleranceCents\":\"abc\" | toleranceCents",
        "\"minWallMm\":3.0 | \"minWallMm\":-1 | limits.minWallMm",
        "\"targetNote\":\"E5\" | \"targetNote\":\"H5\" | bore.fingerings[1].targetNote"
    })
    void badSolveRequestsNameTheField(String from, String to, String field) throws Exception {
        String body = demo();
        assertThat(body).contains(from);
        mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                        .content(body.replaceFirst(java.util.regex.Pattern.quote(from), to)))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }

    /**
     * A full queue (SolveJobs.MAX_WAITING jobs not finished) is answered 429 with a problem document by
     * every solve endpoint alike, and nothing more is queued; the jobs already queued are untouched.
     */
    @Test
    void aFullQueueIsAnswered429ByEverySolveEndpoint() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        List<SolveJob> held = new java.util.ArrayList<>();
        try {
            for (int i = 0; i < SolveJobs.MAX_WAITING; i++) {
                held.add(jobs.submit("test-hold", j -> {
                    try {
                        release.await(60, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    return "released";
                }));
            }
            String bar = "{\"bar\": {\"lengthMm\": 440, \"section\": \"rectangle\", \"widthMm\": 60, \"thicknessMm\": 22,"
                    + " \"material\": \"rosewood\"}, \"note\": \"F3\"}";
            String plate = "{\"plate\": {\"outline\": \"rectangle\", \"lengthMm\": 400, \"widthMm\": 300,"
                    + " \"thicknessMm\": 3.0, \"material\": \"spruce\"}, \"targets\": [{\"mode\": 1, \"targetHz\": 110}],"
                    + " \"unknowns\": {\"thickness\": true}}";
            for (String[] call : new String[][] {{"/api/v1/inverse/tone-holes", demo()},
                {"/api/v1/inverse/bar-tuning", bar}, {"/api/v1/inverse/plate-thickness", plate}}) {
                mvc.perform(post(call[0]).contentType(MediaType.APPLICATION_JSON).content(call[1]))
                        .andExpect(status().isTooManyRequests())
                        .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                        .andExpect(jsonPath("$.status").value(429))
                        .andExpect(jsonPath("$.title").value("Solver busy"));
            }
            assertThat(held).allSatisfy(j -> assertThat(j.status().finished()).isFalse());
        } finally {
            release.countDown();
        }
        for (SolveJob j : held) {
            waitFor(j.id());
        }
    }
}
