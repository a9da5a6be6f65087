package org.nodewright.measurements;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.greaterThan;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nodewright.StoreFreeWebTest;
import org.nodewright.physics.measure.TestRecordings;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

@StoreFreeWebTest
class MeasurementsControllerTest {


    @Autowired
    MockMvc mvc;

    private ResultActions upload(String path, byte[] bytes, String... params) throws Exception {
        var req = multipart(path).file(new MockMultipartFile("file", "take.wav", "audio/wav", bytes));
        for (int i = 0; i < params.length; i += 2) {
            req.param(params[i], params[i + 1]);
        }
        return mvc.perform(req);
    }

    private static void isProblemOn(ResultActions r, String field, String messagePart) throws Exception {
        r.andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field))
                .andExpect(jsonPath("$.errors[0].message", containsString(messagePart)));
    }

    @Test
    void fitsASynthesisedRecordingAsTheContractSays() throws Exception {
        // Fletcher's law with f1 = 164.81 Hz, B = 1.5e-4 (see TestRecordings); 24-bit stereo.
        byte[] wav = TestRecordings.pluck(164.81, 1.5e-4, 2.0, 24, 2);
        String body = upload("/api/v1/measurements/partials", wav, "maxPartials", "25")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.sampleRateHz").value(48000.0))
                .andExpect(jsonPath("$.peaks[0].n").value(1))
                .andExpect(jsonPath("$.peaks[0].frequencyHz", closeTo(164.81 * Math.sqrt(1 + 1.5e-4), 0.01)))
                .andExpect(jsonPath("$.peaks[*].levelDb").isArray())
                .andExpect(jsonPath("$.peaks[*].residualCents").isArray())
                .andExpect(jsonPath("$.fit.f1Hz", closeTo(164.81, 164.81 * 0.0001 / 1.73)))
                .andExpect(jsonPath("$.fit.inharmonicityB", closeTo(1.5e-4, 0.02 * 1.5e-4), Double.class))
                .andExpect(jsonPath("$.fit.rmsCents").isNumber())
                .andReturn().getResponse().getContentAsString();
        assertThat(body).doesNotContain("NaN");
    }

    @Test
    void expectedF1PicksTheSeries() throws Exception {
        byte[] wav = TestRecordings.pluck(110.0, 1e-4, 1.5, 16, 1);
        upload("/api/v1/measurements/partials", wav, "expectedF1Hz", "111")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.fit.f1Hz", closeTo(110.0, 0.005)));
    }

    @Test
    void refusesAFileThatIsNotAWav() throws Exception {
        isProblemOn(upload("/api/v1/measurements/partials", "hello, world".getBytes()), "file", "not a WAV");
    }

    @Test
    void refusesAnEmptyFile() throws Exception {
        isProblemOn(upload("/api/v1/measurements/partials", new byte[0]), "file", "empty");
    }

    @Test
    void refusesATruncatedFile() throws Exception {
        byte[] wav = TestRecordings.pluck(110.0, 1e-4, 1.0, 16, 1);
        isProblemOn(upload("/api/v1/measurements/partials", Arrays.copyOf(wav, wav.length / 2)), "file", "truncated");
    }

    @Test
    void refusesASilentFile() throws Exception {
        isProblemOn(upload("/api/v1/measurements/partials", TestRecordings.silence(48_000)), "file", "silent");
    }

    @Test
    void refusesAMissingFilePart() throws Exception {
        isProblemOn(mvc.perform(multipart("/api/v1/measurements/partials").param("maxPartials", "10")), "file", "required");
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "-5", "0", "abc"})
    void refusesABadExpectedF1(String value) throws Exception {
        byte[] wav = TestRecordings.pluck(110.0, 1e-4, 0.5, 16, 1);
        upload("/api/v1/measurements/partials", wav, "expectedF1Hz", value)
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value("expectedF1Hz"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"1000000000", "0", "1.5"})
    void refusesAnAbsurdMaxPartials(String value) throws Exception {
        byte[] wav = TestRecordings.pluck(110.0, 1e-4, 0.5, 16, 1);
        upload("/api/v1/measurements/partials", wav, "maxPartials", value)
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("maxPartials"));
    }

    @Test
    void aJsonBodyIsNotAnUpload() throws Exception {
        mvc.perform(post("/api/v1/measurements/partials").contentType(MediaType.APPLICATION_JSON).content("{}"))
                .andExpect(status().isUnsupportedMediaType())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"));
    }

    @Test
    void fitsACsvOfPartials() throws Exception {
        // Fletcher 1964, eq. 11, written here (not the code's StiffStringLaw): f_n = n f1 sqrt(1 + B n^2)
        // with f1 = 98 Hz, B = 3e-4.
        StringBuilder csv = new StringBuilder("n,frequencyHz\n");
        for (int n = 1; n <= 12; n++) {
            csv.append(n).append(',').append(n * 98.0 * Math.sqrt(1 + 3e-4 * n * n)).append('\n');
        }
        upload("/api/v1/measurements/partials-csv", csv.toString().getBytes(StandardCharsets.UTF_8))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.sampleRateHz").doesNotExist())
                .andExpect(jsonPath("$.fit.f1Hz", closeTo(98.0, 1e-6)))
                .andExpect(jsonPath("$.fit.inharmonicityB", closeTo(3e-4, 1e-10), Double.class))
                .andExpect(jsonPath("$.peaks.length()").value(12));
    }

    @Test
    void refusesACsvWithTextInANumberColumn() throws Exception {
        isProblemOn(upload("/api/v1/measurements/partials-csv", "n,frequencyHz\n1,98\n2,one-ninety-six\n".getBytes()),
                "file", "line 3, column frequencyHz");
    }

    @Test
    void importsAnImpedanceCurveAndListsItsPeaks() throws Exception {
        StringBuilder csv = new StringBuilder("frequencyHz,magnitude,phaseRad\n");
        for (int i = 0; i < 2000; i++) {
            double f = 100 + i;
            // One resonance 1/(1 + iQ(f/f0 − f0/f)) at f0 = 440 Hz, Q = 20 (Fletcher & Rossing 1998, §1.6).
            double d = 20 * (f / 440 - 440 / f);
            csv.append(f).append(',').append(1 / Math.sqrt(1 + d * d)).append(',').append(Math.atan(-d)).append('\n');
        }
        upload("/api/v1/measurements/impedance", csv.toString().getBytes(), "inputEnd", "closed")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.impedance.frequencyHz.length()").value(2000))
                .andExpect(jsonPath("$.resonances.length()").value(1))
                .andExpect(jsonPath("$.resonances[0].frequencyHz", closeTo(440, 0.5)))
                .andExpect(jsonPath("$.resonances[0].q", closeTo(20, 1)))
                .andExpect(jsonPath("$.maxima[*].n", everyItem(greaterThan(0))));
    }

    @Test
    void refusesAnImpedanceCsvWithTextAndAnUnknownWord() throws Exception {
        isProblemOn(upload("/api/v1/measurements/impedance", "100,1,0\n101,two,0\n102,1,0\n".getBytes()), "file",
                "column magnitude");
        isProblemOn(upload("/api/v1/measurements/impedance", "100,1,0\n101,2,0\n102,1,0\n".getBytes(), "inputEnd", "sideways"),
                "inputEnd", "closed");
    }
}
