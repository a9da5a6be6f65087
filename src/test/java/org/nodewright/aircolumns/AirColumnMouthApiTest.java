package org.nodewright.aircolumns;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

/** The contract's "Mouth ends and breath" through the analyze endpoint. */
@StoreFreeWebTest
class AirColumnMouthApiTest {

    @Autowired
    MockMvc mvc;

    static String whistle(String inputEnd, String mouth, String breath) {
        return """
                {"segments": [{"lengthMm": 258.0, "inputDiameterMm": 13.0, "outputDiameterMm": 13.0}],
                 "inputEnd": "%s", "outputEnd": "open-unflanged", "temperatureC": 20.0, "relativeHumidityPct": 50.0,
                 "fMinHz": 300.0, "fMaxHz": 3000.0, "points": 1000%s%s}"""
                .formatted(inputEnd, mouth == null ? "" : ", \"mouth\": " + mouth,
                        breath == null ? "" : ", \"breath\": " + breath);
    }

    static final String WINDOW = """
            {"kind": "window", "windowLengthMm": 4.0, "windowWidthMm": 8.0, "wallMm": 1.5, "headspaceMm": 0.0}""";

    MvcResult analyze(String body) throws Exception {
        return mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON).content(body))
                .andReturn();
    }

    @Test
    void aWindowLowersEveryResonanceAndReportsItsLength() throws Exception {
        String bare = analyze(whistle("open", null, null)).getResponse().getContentAsString();
        MvcResult r = analyze(whistle("open", WINDOW, null));
        assertThat(r.getResponse().getStatus()).isEqualTo(200);
        String json = r.getResponse().getContentAsString();
        double dl = ((Number) JsonPath.read(json, "$.mouth.endCorrectionMm")).doubleValue();
        // The orifice inertance of a 4 x 8 mm window in a 1.5 mm wall on a 13 mm bore:
        // (S / S_w) t' with t' = t + 2 x 0.82 a_eq = 1.5 + 1.64 x 3.19 mm -> about 28 mm
        // (Fletcher & Rossing 1998 ch. 17's mouth correction, both ends flanged, inner side taken
        // as flanged too); the model's inner correction is smaller (t_i at delta = 0.49), so expect
        // 20..30 mm.
        assertThat(dl).isBetween(20.0, 30.0);
        List<Number> withF = JsonPath.read(json, "$.resonances[*].frequencyHz");
        List<Number> bareF = JsonPath.read(bare, "$.resonances[*].frequencyHz");
        List<Number> cents = JsonPath.read(json, "$.resonances[*].mouthCents");
        for (int i = 0; i < 3; i++) {
            double fw = withF.get(i).doubleValue();
            double fb = bareF.get(i).doubleValue();
            assertThat(fw).isLessThan(fb);
            double c = 1200 * Math.log(fw / fb) / Math.log(2);
            assertThat(cents.get(i).doubleValue()).isCloseTo(c, offset(1e-6));
            assertThat(((Number) JsonPath.read(json, "$.mouth.resonances[" + i + "].cents")).doubleValue())
                    .isCloseTo(c, offset(1e-6));
        }
        // The equivalent length checks out: the bare tube lengthened by endCorrectionMm has the
        // mouth's lowest resonance (to 0.01 cent).
        String longer = whistle("open", null, null).replace("258.0", String.valueOf(258.0 + dl));
        double f1 = ((Number) JsonPath.read(analyze(longer).getResponse().getContentAsString(),
                "$.resonances[0].frequencyHz")).doubleValue();
        assertThat(1200 * Math.log(f1 / withF.get(0).doubleValue()) / Math.log(2)).isCloseTo(0, offset(0.01));
        assertThat((Object) JsonPath.read(json, "$.air.alongBore")).isNull();
    }

    @Test
    void breathGivesTheAirAlongTheBore() throws Exception {
        String json = analyze(whistle("open", WINDOW, """
                {"co2Pct": 4.0, "relativeHumidityPct": 90.0, "inputTemperatureC": 32.0, "outputTemperatureC": 24.0}"""))
                .getResponse().getContentAsString();
        List<Number> x = JsonPath.read(json, "$.air.alongBore[*].xMm");
        List<Number> t = JsonPath.read(json, "$.air.alongBore[*].temperatureC");
        assertThat(x.get(0).doubleValue()).isEqualTo(0.0);
        assertThat(x.get(x.size() - 1).doubleValue()).isCloseTo(258.0, offset(1e-9));
        assertThat(t.get(0).doubleValue()).isEqualTo(32.0);
        assertThat(t.get(t.size() - 1).doubleValue()).isEqualTo(24.0);
        assertThat(((Number) JsonPath.read(json, "$.air.alongBore[0].co2Pct")).doubleValue()).isCloseTo(4.0,
                offset(1e-12));
        // The room's air stays what the request says.
        assertThat(((Number) JsonPath.read(json, "$.air.temperatureC")).doubleValue()).isEqualTo(20.0);
    }

    @Test
    void eachKindIsAccepted() throws Exception {
        String emb = """
                {"kind": "embouchure", "holeDiameterMm": 10.0, "wallMm": 4.5, "headspaceMm": 17.0, "lipCoveragePct": 25.0}""";
        String oval = """
                {"kind": "embouchure", "holeLengthMm": 12.0, "holeWidthMm": 10.0, "wallMm": 4.5, "headspaceMm": 17.0}""";
        String reed = """
                {"kind": "reed", "equivalentVolumeMm3": 900.0}""";
        String cup = """
                {"kind": "cup", "cupVolumeMm3": 1100.0, "throatDiameterMm": 3.7, "throatLengthMm": 7.0}""";
        for (String[] c : new String[][] {{"open", emb}, {"open", oval}, {"closed", reed}, {"closed", cup}}) {
            MvcResult r = analyze(whistle(c[0], c[1], null));
            assertThat(r.getResponse().getStatus()).as(c[1]).isEqualTo(200);
            double dl = ((Number) JsonPath.read(r.getResponse().getContentAsString(), "$.mouth.endCorrectionMm")).doubleValue();
            assertThat(dl).as(c[1]).isPositive();
        }
        String json = analyze(whistle("closed", cup, null)).getResponse().getContentAsString();
        assertThat(((Number) JsonPath.read(json, "$.mouth.helmholtzHz")).doubleValue()).isPositive();
    }

    // Contradictions and bad values: 400 problem documents naming the field.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // inputEnd | mouth | field
        "closed | {\"kind\": \"window\", \"windowLengthMm\": 4.0, \"windowWidthMm\": 8.0, \"wallMm\": 1.5} | mouth.kind",
        "open | {\"kind\": \"reed\", \"equivalentVolumeMm3\": 900.0} | mouth.kind",
        "open | {\"kind\": \"embouchure\", \"holeDiameterMm\": 10.0, \"wallMm\": 4.5, \"headspaceMm\": 17.0, \"lipCoveragePct\": 85.0} | mouth.lipCoveragePct",
        "open | {\"kind\": \"embouchure\", \"holeDiameterMm\": 10.0, \"wallMm\": 4.5, \"headspaceMm\": 17.0, \"lipCoveragePct\": -1.0} | mouth.lipCoveragePct",
        "open | {\"kind\": \"embouchure\", \"holeDiameterMm\": 10.0, \"wallMm\": 4.5, \"headspaceMm\": -2.0} | mouth.headspaceMm",
        "open | {\"kind\": \"window\", \"windowLengthMm\": 4.0, \"windowWidthMm\": 41.0, \"wallMm\": 1.5} | mouth.windowWidthMm",
        "open | {\"kind\": \"whistle\", \"windowLengthMm\": 4.0} | mouth.kind",
        "open | {\"kind\": \"window\", \"windowLengthMm\": 4.0, \"wallMm\": 1.5} | mouth.windowWidthMm",
        "open | {\"kind\": \"window\", \"windowLengthMm\": 4.0, \"windowWidthMm\": 8.0, \"wallMm\": 1.5, \"cupVolumeMm3\": 5.0} | mouth.cupVolumeMm3",
        "open | {\"kind\": \"embouchure\", \"holeDiameterMm\": 10.0, \"holeLengthMm\": 12.0, \"holeWidthMm\": 10.0, \"wallMm\": 4.5, \"headspaceMm\": 1.0} | mouth.holeDiameterMm",
        "closed | {\"kind\": \"cup\", \"cupVolumeMm3\": 1100.0, \"throatDiameterMm\": \"NaN\", \"throatLengthMm\": 7.0} | mouth.throatDiameterMm",
    })
    void badMouthsAre400sNamingTheField(String inputEnd, String mouth, String field) throws Exception {
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON)
                        .content(whistle(inputEnd, mouth, null)))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[*].field").value(org.hamcrest.Matchers.hasItem(field)));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "{\"co2Pct\": 25.0, \"relativeHumidityPct\": 90.0, \"inputTemperatureC\": 32.0, \"outputTemperatureC\": 24.0} | breath.co2Pct",
        "{\"co2Pct\": 4.0, \"relativeHumidityPct\": 101.0, \"inputTemperatureC\": 32.0, \"outputTemperatureC\": 24.0} | breath.relativeHumidityPct",
        "{\"co2Pct\": 4.0, \"relativeHumidityPct\": 90.0, \"outputTemperatureC\": 24.0} | breath.inputTemperatureC",
    })
    void badBreathIs400NamingTheField(String breath, String field) throws Exception {
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON)
                        .content(whistle("open", WINDOW, breath)))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field").value(org.hamcrest.Matchers.hasItem(field)));
    }
}
