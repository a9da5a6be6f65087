package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import java.util.Locale;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Calibration from a measured impedance: the "measurement" is a closed-form curve written here,
 * not the tool's model, so the fit has something outside itself to meet.
 */
@StoreFreeWebTest
class CalibrationImpedanceTest {

    @Autowired
    MockMvc mvc;

    static final double L_MM = 280;
    static final double A_MM = 6.5;
    /**
     * The player's end of the synthetic tube: a lumped inertance rho l / S_w in series, written as
     * its length in the bore's area, L_i = l S / S_w, mm (longer than a 4 x 8 mm window gives, ~27 mm).
     */
    static final double INERTANCE_MM = 36;

    /** Dry air at 20 C: c = 331.3 sqrt(1 + T / 273.15) m/s (ideal gas; common handbook form). */
    static final double C = 331.3 * Math.sqrt(1 + 20 / 273.15);

    /** The tube and its unflanged far end's 0.6133 a (Levine & Schwinger 1948), m. */
    static final double L_PIPE = (L_MM + 0.6133 * A_MM) * 1e-3;

    /**
     * The input impedance over Z0 of a lossy cylinder open at its effective far end, behind a
     * series inertance (the lumped window of Fletcher & Rossing 1998 ch. 17, from memory):
     * Z / Z0 = j k L_i + j tan((k - j alpha) L), with the wall-loss attenuation
     * alpha = 3e-5 sqrt(f) / a (a in m; Fletcher & Rossing 1998 eq. (8.18), from memory) and
     * tan(x - j y) = (sin 2x - j sinh 2y) / (cos 2x + cosh 2y).
     */
    static double[] impedance(double f) {
        double k = 2 * Math.PI * f / C;
        double x = k * L_PIPE;
        double y = 3e-5 * Math.sqrt(f) / (A_MM * 1e-3) * L_PIPE;
        double den = Math.cos(2 * x) + Math.cosh(2 * y);
        double re = Math.sin(2 * x) / den + k * INERTANCE_MM * 1e-3;
        double im = -Math.sinh(2 * y) / den;
        return new double[] {-im, re}; // j (re + j im)
    }

    /** The lossless minima: roots of tan(kL) + k L_i = 0, one per branch (n - 1/2) pi < kL < n pi, by bisection. */
    static double minimumHz(int n) {
        double lo = (n - 0.5) * Math.PI + 1e-9;
        double hi = n * Math.PI;
        for (int i = 0; i < 200; i++) {
            double mid = (lo + hi) / 2;
            double g = Math.tan(mid) + mid / L_PIPE * INERTANCE_MM * 1e-3;
            if (g < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2 / L_PIPE * C / (2 * Math.PI);
    }

    static String curve(double fromHz, double toHz, double stepHz) {
        StringBuilder csv = new StringBuilder("frequencyHz,magnitude,phaseRad\n");
        for (double f = fromHz; f <= toHz; f += stepHz) {
            double[] z = impedance(f);
            csv.append(String.format(Locale.ROOT, "%.3f,%.9g,%.9g%n", f, Math.hypot(z[0], z[1]), Math.atan2(z[1], z[0])));
        }
        return csv.toString();
    }

    static String body(String impedance) {
        return "{\"bore\":{\"segments\":[{\"lengthMm\":" + L_MM + ",\"inputDiameterMm\":13,\"outputDiameterMm\":13}],"
                + "\"inputEnd\":\"open\",\"outputEnd\":\"open-unflanged\",\"temperatureC\":20,\"relativeHumidityPct\":0,"
                + "\"fMinHz\":200,\"fMaxHz\":3000,"
                + "\"mouth\":{\"kind\":\"window\",\"windowLengthMm\":4.0,\"windowWidthMm\":8.0,\"wallMm\":1.5,\"headspaceMm\":0},"
                + "\"fingerings\":[{\"name\":\"blank\",\"closedHoles\":[],\"targetNote\":\"D5\"}]},"
                + "\"impedance\":" + impedance + "}";
    }

    static String quoted(String s) {
        return "\"" + s.replace("\n", "\\n") + "\"";
    }

    String run(String body) throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/calibration").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        String id = JsonPath.read(created, "$.id");
        for (int i = 0; i < 1200; i++) {
            String job = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders
                    .get("/api/v1/inverse/jobs/" + id)).andReturn().getResponse().getContentAsString();
            String s = JsonPath.read(job, "$.status");
            if (!"queued".equals(s) && !"running".equals(s)) {
                return job;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the job did not finish");
    }

    static double number(String json, String path) {
        return ((Number) JsonPath.read(json, path)).doubleValue();
    }

    @Test
    void theWindowIsFittedToTheResonancesOfAMeasuredCurve() throws Exception {
        String done = run(body("{\"fingering\":\"blank\",\"csv\":" + quoted(curve(300, 2000, 0.5))
                + ",\"maxPeaks\":3}"));
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("succeeded");
        // the peaks found are the closed form's minima (the losses move them by far less than a cent)
        List<Double> found = ToneHoleSolveControllerTest.numbers(done, "$.result.impedancePeaks[*].measuredHz");
        assertThat(found).hasSize(3);
        for (int n = 1; n <= 3; n++) {
            assertThat(1200 * Math.log(found.get(n - 1) / minimumHz(n)) / Math.log(2)).isCloseTo(0, within(1.0));
        }
        assertThat((List<Boolean>) JsonPath.read(done, "$.result.impedancePeaks[*].used")).containsOnly(true);
        List<Double> after = ToneHoleSolveControllerTest.numbers(done, "$.result.notes[*].modelAfterHz");
        assertThat(after).hasSize(3);
        // the calibrated model's resonances meet the curve's
        for (int n = 1; n <= 3; n++) {
            double cents = 1200 * Math.log(after.get(n - 1) / minimumHz(n)) / Math.log(2);
            assertThat(cents).as("resonance " + n).isCloseTo(0, within(5.0));
        }
        double before = number(done, "$.result.rmsCentsBefore");
        double rms = number(done, "$.result.rmsCentsAfter");
        System.out.println("impedance calibration: window " + number(done, "$.result.parameters[0].fittedValue")
                + " mm, rms " + before + " -> " + rms + " cents, model after " + after);
        assertThat(rms).isLessThan(before / 4).isLessThan(3.0);
        // a longer end correction asks for a smaller window (its inertance grows as it shrinks; Ingerslev & Frobenius 1947)
        assertThat((String) JsonPath.read(done, "$.result.parameters[0].field")).isEqualTo("mouth.windowLengthMm");
        assertThat(number(done, "$.result.parameters[0].fittedValue")).isLessThan(4.0);
        assertThat((String) JsonPath.read(done, "$.result.notes[0].fingering")).isEqualTo("impedance peak 1");
    }

    void refused(String body, String field) throws Exception {
        mvc.perform(post("/api/v1/inverse/calibration").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", Matchers.hasItem(field)));
    }

    @Test
    void badCurvesAreRefusedNamingTheField() throws Exception {
        refused(body("{\"csv\":" + quoted("frequencyHz,magnitude,phase\n100,1,0\n200,abc,0\n300,1,0\n") + "}"),
                "impedance.csv");
        refused(body("{\"csv\":" + quoted("100,1\n200,2\n300,1\n") + "}"), "impedance.csv");
        refused(body("{\"csv\":" + quoted("300,1,0\n200,2,0\n100,1,0\n") + "}"), "impedance.csv");
        // a flat curve has no resonance
        refused(body("{\"csv\":" + quoted("100,1,0\n200,1,0\n300,1,0\n400,1,0\n") + "}"), "impedance.csv");
        refused(body("{\"csv\":\"\"}"), "impedance.csv");
        refused(body("{}"), "impedance.csv");
        String good = quoted(curve(300, 2000, 2));
        refused(body("{\"fingering\":\"nothing\",\"csv\":" + good + "}"), "impedance.fingering");
        refused(body("{\"phaseUnit\":\"grad\",\"csv\":" + good + "}"), "impedance.phaseUnit");
        refused(body("{\"minProminenceDb\":99,\"csv\":" + good + "}"), "impedance.minProminenceDb");
        refused(body("{\"maxPeaks\":0,\"csv\":" + good + "}"), "impedance.maxPeaks");
        // neither pitches nor a curve
        refused(body("null"), "measured");
    }
}
