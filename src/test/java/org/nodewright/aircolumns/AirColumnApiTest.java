package org.nodewright.aircolumns;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

@StoreFreeWebTest
class AirColumnApiTest {


    @Autowired
    MockMvc mvc;

    static final String STOPPED_PIPE = """
            {"segments": [{"lengthMm": 300.0, "inputDiameterMm": 15.0, "outputDiameterMm": 15.0}],
             "inputEnd": "closed", "outputEnd": "ideal-open", "temperatureC": 20.0, "relativeHumidityPct": 0.0,
             "losses": false, "fMinHz": 20.0, "fMaxHz": 3000.0, "points": 4000}""";

    MvcResult analyze(String body) throws Exception {
        return mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON).content(body))
                .andReturn();
    }

    @Test
    void stoppedCylinderResonatesAtOddQuarterWavelengths() throws Exception {
        MvcResult r = analyze(STOPPED_PIPE);
        assertThat(r.getResponse().getStatus()).isEqualTo(200);
        String json = r.getResponse().getContentAsString();
        double c = JsonPath.read(json, "$.speedOfSoundMps");
        List<Double> f = JsonPath.read(json, "$.resonances[*].frequencyHz");
        // (2n - 1) c / 4L for a cylinder closed at x = 0 and p = 0 at x = L (textbook quarter-wave pipe)
        for (int n = 1; n <= f.size(); n++) {
            double expected = (2 * n - 1) * c / (4 * 0.300);
            assertThat(1200 * Math.log(f.get(n - 1) / expected) / Math.log(2)).isBetween(-0.1, 0.1);
        }
        assertThat(f).hasSize(5);
        assertThat((String) JsonPath.read(json, "$.series")).isEqualTo("odd");
        List<Double> nodes = JsonPath.read(json, "$.resonances[1].pressureNodesMm");
        // Second mode of the quarter-wave pipe: p ~ cos(3 pi x / 2L), nodes at L/3 and L.
        assertThat(nodes).hasSize(2);
        assertThat(nodes.get(0)).isCloseTo(100.0, org.assertj.core.data.Offset.offset(0.05));
        assertThat(nodes.get(1)).isCloseTo(300.0, org.assertj.core.data.Offset.offset(1e-9));
        List<Double> mags = JsonPath.read(json, "$.impedance.magnitude");
        assertThat(mags).hasSize(4000);
    }

    @Test
    void fingeringsArePredicted() throws Exception {
        String body = """
                {"segments": [{"lengthMm": 300.0, "inputDiameterMm": 15.0, "outputDiameterMm": 15.0}],
                 "inputEnd": "open", "outputEnd": "open-unflanged",
                 "holes": [{"positionMm": 200.0, "diameterMm": 6.0, "chimneyMm": 3.0, "open": true}],
                 "fMinHz": 100.0, "fMaxHz": 3000.0, "points": 1000,
                 "fingerings": [{"name": "all closed", "closedHoles": [0], "targetNote": "C#5"},
                                {"name": "open", "closedHoles": [], "targetHz": 700.0, "register": 1}]}""";
        MvcResult r = analyze(body);
        assertThat(r.getResponse().getStatus()).isEqualTo(200);
        String json = r.getResponse().getContentAsString();
        double closed = JsonPath.read(json, "$.fingerings[0].predictedHz");
        double open = JsonPath.read(json, "$.fingerings[1].predictedHz");
        // Opening a hole shortens the acoustic length: the pitch must rise (common practice).
        assertThat(open).isGreaterThan(closed * 1.1);
        assertThat((Double) JsonPath.read(json, "$.fingerings[0].targetHz")).isCloseTo(554.365,
                org.assertj.core.data.Offset.offset(0.01));
    }

    @Test
    void aTargetNoteTypedAsHertzWithItsUnitIsTakenAsWritten() throws Exception {
        String body = """
                {"segments": [{"lengthMm": 300.0, "inputDiameterMm": 15.0, "outputDiameterMm": 15.0}],
                 "inputEnd": "open", "outputEnd": "open-unflanged", "fMinHz": 100.0, "fMaxHz": 3000.0, "points": 500,
                 "fingerings": [{"name": "typed", "closedHoles": [], "targetNote": "329.63 Hz"},
                                {"name": "comma", "closedHoles": [], "targetNote": "329,63"}]}""";
        MvcResult r = analyze(body);
        assertThat(r.getResponse().getStatus()).as(r.getResponse().getContentAsString()).isEqualTo(200);
        String json = r.getResponse().getContentAsString();
        assertThat((Double) JsonPath.read(json, "$.fingerings[0].targetHz")).isEqualTo(329.63);
        assertThat((Double) JsonPath.read(json, "$.fingerings[1].targetHz")).isEqualTo(329.63);
        MvcResult bad = analyze(body.replace("329,63", "329.63 kHz"));
        assertThat(bad.getResponse().getStatus()).isEqualTo(400);
        assertThat(bad.getResponse().getContentAsString()).contains("fingerings[1].targetNote");
    }

    // The server reads fingering targets with the one note grammar (src/test/resources/tuning/note-names.csv):
    // flats and sharps as letters or as the signs U+266D/U+266F, doubled, across the octave boundary
    // (Cb4 = B3, B#3 = C4), two-digit and negative octaves. Frequencies: 440 * 2^((midi - 69)/12) at
    // A4 = 440 Hz (ISO 16), the table's values (Python 3 math.pow), to 1e-9 relative.
    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            Cb4  | 246.94165062806206
            B#3  | 261.62556530059862
            Bb3  | 233.08188075904496
            B♭4  | 466.16376151808993
            C♯4  | 277.18263097687208
            F##2 | 97.998858995437331
            E-1  | 10.300861153527183
            C10  | 16744.036179238312
            """)
    void fingeringTargetsFollowTheSharedNoteGrammar(String note, double hz) throws Exception {
        String body = STOPPED_PIPE.replace("\"losses\": false", "\"losses\": false, \"holes\": [{\"positionMm\": "
                + "100.0, \"diameterMm\": 6.0, \"chimneyMm\": 3.0}], \"fingerings\": [{\"closedHoles\": [0], "
                + "\"targetNote\": \"" + note + "\"}]");
        MvcResult r = analyze(body);
        assertThat(r.getResponse().getStatus()).as(r.getResponse().getContentAsString()).isEqualTo(200);
        double target = ((Number) JsonPath.read(r.getResponse().getContentAsString(), "$.fingerings[0].targetHz"))
                .doubleValue();
        assertThat(target).isCloseTo(hz, org.assertj.core.data.Offset.offset(hz * 1e-9));
    }

    @ParameterizedTest
    @ValueSource(strings = {"H4", "C11", "C-2", "Cbbb4", "C#b4", "Ab", "C 4"})
    void textThatIsNotANoteNameIsRefusedOnTheFingeringsTarget(String note) throws Exception {
        String body = STOPPED_PIPE.replace("\"losses\": false", "\"losses\": false, \"holes\": [{\"positionMm\": "
                + "100.0, \"diameterMm\": 6.0, \"chimneyMm\": 3.0}], \"fingerings\": [{\"closedHoles\": [0], "
                + "\"targetNote\": \"" + note + "\"}]");
        expect400(body, "fingerings[0].targetNote");
    }

    // Malformed requests: each must be a 400 problem document naming the offending field.
    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            "lengthMm": 300.0                         | "lengthMm": -1.0                      | segments[0].lengthMm
            "lengthMm": 300.0                         | "lengthMm": 0                         | segments[0].lengthMm
            "lengthMm": 300.0                         | "lengthMm": 1e400                     | segments[0].lengthMm
            "lengthMm": 300.0                         | "lengthMm": "300"                     | segments[0].lengthMm
            "lengthMm": 300.0                         | "lengthMm": null                      | segments[0].lengthMm
            "inputDiameterMm": 15.0                   | "inputDiameterMm": 0.0                | segments[0].inputDiameterMm
            "outputDiameterMm": 15.0                  | "outputDiameterMm": NaN               | segments[0].outputDiameterMm
            "lengthMm": 300.0                         | "lengthMm": Infinity                  | segments[0].lengthMm
            "inputEnd": "closed"                      | "inputEnd": "reed"                    | inputEnd
            "inputEnd": "closed"                      | "inputEnd": 1                         | inputEnd
            "outputEnd": "ideal-open"                 | "outputEnd": "open"                   | outputEnd
            "outputEnd": "ideal-open"                 | "outputEnd": null                     | outputEnd
            "fMaxHz": 3000.0                          | "fMaxHz": 20.0                        | fMaxHz
            "fMaxHz": 3000.0                          | "fMaxHz": 10.0                        | fMaxHz
            "fMinHz": 20.0                            | "fMinHz": -5.0                        | fMinHz
            "points": 4000                            | "points": 1000000000                  | points
            "points": 4000                            | "points": 1                           | points
            "points": 4000                            | "points": 12.5                        | points
            "temperatureC": 20.0                      | "temperatureC": 500.0                 | temperatureC
            "relativeHumidityPct": 0.0                | "relativeHumidityPct": 101.0          | relativeHumidityPct
            "losses": false                           | "losses": "no"                        | losses
            "losses": false                           | "losses": false, "colour": "red"      | colour
            """)
    void malformedRequestsAre400sNamingTheField(String from, String to, String field) throws Exception {
        String body = STOPPED_PIPE.replace(from, to);
        assertThat(body).isNotEqualTo(STOPPED_PIPE);
        expect400(body, field);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            {"positionMm": 350.0, "diameterMm": 6.0, "chimneyMm": 3.0, "open": true}  | holes[0].positionMm
            {"positionMm": 300.0, "diameterMm": 6.0, "chimneyMm": 3.0, "open": true}  | holes[0].positionMm
            {"positionMm": 100.0, "diameterMm": 16.0, "chimneyMm": 3.0, "open": true} | holes[0].diameterMm
            {"positionMm": 100.0, "diameterMm": -6.0, "chimneyMm": 3.0, "open": true} | holes[0].diameterMm
            {"positionMm": 100.0, "diameterMm": 6.0, "chimneyMm": -3.0, "open": true} | holes[0].chimneyMm
            {"positionMm": 100.0, "diameterMm": 6.0, "open": true}                    | holes[0].chimneyMm
            """)
    void badHolesAre400s(String hole, String field) throws Exception {
        String body = STOPPED_PIPE.replace("\"losses\": false", "\"losses\": false, \"holes\": [" + hole + "]");
        expect400(body, field);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            {"closedHoles": [3], "targetHz": 400.0}                       | fingerings[0].closedHoles[0]
            {"closedHoles": [0], "targetNote": "H9"}                      | fingerings[0].targetNote
            {"closedHoles": [0]}                                          | fingerings[0].targetHz
            {"closedHoles": [0], "targetHz": 400.0, "targetNote": "G4"}   | fingerings[0].targetHz
            {"closedHoles": [0], "targetHz": 400.0, "register": 0}        | fingerings[0].register
            {"targetHz": 400.0}                                           | fingerings[0].closedHoles
            """)
    void badFingeringsAre400s(String fingering, String field) throws Exception {
        String body = STOPPED_PIPE.replace("\"losses\": false", "\"losses\": false, \"holes\": [{\"positionMm\": "
                + "100.0, \"diameterMm\": 6.0, \"chimneyMm\": 3.0}], \"fingerings\": [" + fingering + "]");
        expect400(body, field);
    }

    @Test
    void missingSegmentsTruncatedJsonAndWrongMediaTypeAreProblems() throws Exception {
        expect400("{\"inputEnd\": \"closed\", \"outputEnd\": \"closed\", \"fMinHz\": 20.0, \"fMaxHz\": 30.0}",
                "segments");
        expect400(STOPPED_PIPE.replace("[{\"lengthMm\": 300.0, \"inputDiameterMm\": 15.0, \"outputDiameterMm\": 15.0}]",
                "[]"), "segments");
        expect400(STOPPED_PIPE.substring(0, 60), null);
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.TEXT_PLAIN).content(STOPPED_PIPE))
                .andExpect(status().isUnsupportedMediaType())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    void expect400(String body, String field) throws Exception {
        var result = mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
        if (field != null) {
            result.andExpect(jsonPath("$.errors[*].field").value(org.hamcrest.Matchers.hasItem(field)));
        }
    }
}
